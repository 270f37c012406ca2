// The single authorization module. Client components import "@/lib/authz/policy" (pure);
// server code may import from here.
export * from "./policy";
export { authorizeWorkspace, isUuid } from "./authorize";
