// Zod schemas shared by forms (react-hook-form + zodResolver) and route handlers.
export * from "./fields";
export * from "./auth";
export * from "./account";
export * from "./workspace";
