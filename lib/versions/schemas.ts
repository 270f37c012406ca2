// Request bodies of the versions, threads and reviews API (forms and route handlers share them).
import { z } from "zod";
import { ANCHOR_KINDS } from "./anchors";
import { COMMENT_MAX_CHARS } from "./markup";

export const saveVersionSchema = z.object({
  name: z.string({ error: "enter a version name" }).trim().min(1, "enter a version name").max(120, "a version name has at most 120 characters"),
  message: z.string().trim().max(2000, "the message has at most 2000 characters").default(""),
});

const body = z
  .string({ error: "write a comment" })
  .trim()
  .min(1, "write a comment")
  .max(COMMENT_MAX_CHARS, `a comment has at most ${COMMENT_MAX_CHARS} characters`);

const uuid = (what: string) => z.string({ error: `${what} is missing` }).uuid(`${what} is not a valid id`);

export const createThreadSchema = z.object({
  versionId: uuid("versionId"),
  anchor: z.object({
    kind: z.enum(ANCHOR_KINDS, { error: `anchor.kind is one of ${ANCHOR_KINDS.join(", ")}` }),
    key: z.string({ error: "anchor.key is missing" }).trim().min(1, "anchor.key is empty").max(200, "anchor.key is too long"),
  }),
  body,
});

export const replySchema = z.object({ body });

export const resolveThreadSchema = z.object({ resolved: z.boolean({ error: "resolved is true or false" }) });

export const requestReviewSchema = z.object({
  versionId: uuid("versionId"),
  reviewerIds: z.array(uuid("reviewer id"), { error: "name at least one reviewer" }).min(1, "name at least one reviewer").max(20, "at most 20 reviewers"),
  message: z.string().trim().max(2000, "the message has at most 2000 characters").default(""),
});

export const verdictSchema = z.object({
  verdict: z.enum(["approve", "changes_requested"], { error: "verdict is approve or changes_requested" }),
  comment: z.string().trim().max(COMMENT_MAX_CHARS, `a comment has at most ${COMMENT_MAX_CHARS} characters`).default(""),
}).refine((v) => v.verdict !== "changes_requested" || v.comment !== "", { message: "say which changes you ask for", path: ["comment"] });

export const notificationSettingsSchema = z.object({
  reviewRequests: z.boolean({ error: "reviewRequests is true or false" }),
  mentions: z.boolean({ error: "mentions is true or false" }),
  verdicts: z.boolean({ error: "verdicts is true or false" }),
});
