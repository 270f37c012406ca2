// Light formatting for comments: **bold**, _italic_, `code`, [text](url), bare http(s) links and
// @mentions. Parsed into tokens (never HTML), so nothing a user writes can become markup;
// toHtml escapes every piece for e-mails.
import { escapeHtml } from "./escape";

export type Token =
  | { type: "text"; text: string }
  | { type: "bold"; text: string }
  | { type: "italic"; text: string }
  | { type: "code"; text: string }
  | { type: "link"; text: string; href: string }
  | { type: "mention"; text: string; handle: string };

export const COMMENT_MAX_CHARS = 4000;

// One alternation, tried left to right at each position; the first group that matches wins.
const PATTERN = new RegExp(
  [
    "`([^`\\n]+)`", // 1 code
    "\\*\\*([^*\\n]+)\\*\\*", // 2 bold
    "(?<![\\w])_([^_\\n]+)_(?![\\w])", // 3 italic (not inside snake_case names)
    "\\[([^\\]\\n]+)\\]\\(((?:https?://|/)[^\\s)]+)\\)", // 4 text, 5 href
    "(https?://[^\\s<>()]+[^\\s<>().,;:!?'\"])", // 6 bare link
    "(?<![\\w@.])@([A-Za-z0-9._+-]+(?:@[A-Za-z0-9-]+(?:\\.[A-Za-z0-9-]+)+)?)", // 7 mention
  ].join("|"),
  "g",
);

export function parseMarkup(body: string): Token[] {
  const tokens: Token[] = [];
  let last = 0;
  for (const m of body.matchAll(PATTERN)) {
    const at = m.index ?? 0;
    if (at > last) tokens.push({ type: "text", text: body.slice(last, at) });
    last = at + m[0].length;
    if (m[1] !== undefined) tokens.push({ type: "code", text: m[1] });
    else if (m[2] !== undefined) tokens.push({ type: "bold", text: m[2] });
    else if (m[3] !== undefined) tokens.push({ type: "italic", text: m[3] });
    else if (m[4] !== undefined) tokens.push({ type: "link", text: m[4], href: m[5]! });
    else if (m[6] !== undefined) tokens.push({ type: "link", text: m[6], href: m[6] });
    else {
      // a sentence-ending dot is not part of the handle
      const handle = m[7]!.replace(/[.]+$/, "");
      tokens.push({ type: "mention", text: `@${handle}`, handle });
      last = at + 1 + handle.length;
    }
  }
  if (last < body.length) tokens.push({ type: "text", text: body.slice(last) });
  return tokens;
}

/** The handles written as @mentions, lower-cased, once each. */
export function mentionedHandles(body: string): string[] {
  const out = new Set<string>();
  for (const t of parseMarkup(body)) if (t.type === "mention") out.add(t.handle.toLowerCase());
  return [...out];
}

export interface Mentionable {
  userId: string;
  email: string;
  name: string;
}

/** The handle that mentions a member: the local part of the e-mail, or the whole address when the local part is shared. */
export function handleOf(member: Mentionable, all: readonly Mentionable[]): string {
  const local = member.email.split("@")[0]!.toLowerCase();
  const shared = all.filter((m) => m.email.split("@")[0]!.toLowerCase() === local).length > 1;
  return shared ? member.email.toLowerCase() : local;
}

/** Members named by @mentions: a full e-mail address, or an unambiguous local part. */
export function resolveMentions(body: string, members: readonly Mentionable[]): Mentionable[] {
  const found = new Map<string, Mentionable>();
  for (const handle of mentionedHandles(body)) {
    const exact = members.find((m) => m.email.toLowerCase() === handle);
    const byLocal = members.filter((m) => m.email.split("@")[0]!.toLowerCase() === handle);
    const hit = exact ?? (byLocal.length === 1 ? byLocal[0] : undefined);
    if (hit) found.set(hit.userId, hit);
  }
  return [...found.values()];
}

export function toHtml(body: string): string {
  return parseMarkup(body)
    .map((t) => {
      switch (t.type) {
        case "text": return escapeHtml(t.text).replace(/\n/g, "<br>");
        case "bold": return `<strong>${escapeHtml(t.text)}</strong>`;
        case "italic": return `<em>${escapeHtml(t.text)}</em>`;
        case "code": return `<code>${escapeHtml(t.text)}</code>`;
        case "link": return `<a href="${escapeHtml(t.href)}">${escapeHtml(t.text)}</a>`;
        case "mention": return `<strong>${escapeHtml(t.text)}</strong>`;
      }
    })
    .join("");
}

/** Plain text for e-mails: formatting marks dropped, links written out. */
export function toPlainText(body: string): string {
  return parseMarkup(body)
    .map((t) => (t.type === "link" && t.text !== t.href ? `${t.text} (${t.href})` : t.text))
    .join("");
}
