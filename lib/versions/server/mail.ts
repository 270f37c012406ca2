// E-mails of design reviews: review requests, mentions, verdicts. Plain text first, simple HTML
// beside it; every user-written piece is escaped (comment bodies go through the markup tokens).
import type { MailContent } from "@/lib/mail/templates";
import { escapeHtml } from "../escape";
import { toHtml, toPlainText } from "../markup";

function layout(paragraphs: string[], quoteHtml: string | null, link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 14px">${escapeHtml(p)}</p>`).join("\n");
  const quote = quoteHtml ? `<blockquote style="margin:0 0 14px;padding:8px 12px;border-left:3px solid #c9bfa9;color:#3b3833">${quoteHtml}</blockquote>` : "";
  return `<!doctype html>
<html><body style="margin:0;padding:24px;background:#f6f1e7;color:#1f1d1a;font-family:system-ui,sans-serif;font-size:15px;line-height:1.5">
<div style="max-width:560px;margin:0 auto;background:#fffdf8;border:1px solid #e3dccd;border-radius:8px;padding:24px">
<p style="margin:0 0 18px;font-weight:600;letter-spacing:.02em">Joulebook</p>
${body}
${quote}
<p style="margin:20px 0"><a href="${escapeHtml(link.href)}" style="background:#1f1d1a;color:#fffdf8;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(link.label)}</a></p>
<p style="margin:0;color:#6b665c;font-size:13px">Or paste this address into your browser:<br>${escapeHtml(link.href)}</p>
<p style="margin:14px 0 0;color:#6b665c;font-size:12px">You can turn these e-mails off on your account page.</p>
</div></body></html>`;
}

function compose(subject: string, lines: string[], quote: string | null, link: { href: string; label: string }): MailContent {
  const quoted = quote ? `\n\n> ${toPlainText(quote).split("\n").join("\n> ")}` : "";
  return {
    subject,
    text: `${lines.join("\n\n")}${quoted}\n\n${link.label}:\n${link.href}\n\nYou can turn these e-mails off on your account page.\n`,
    html: layout(lines, quote ? toHtml(quote) : null, link),
  };
}

export function reviewRequestMail(args: { requester: string; document: string; version: string; message: string; link: string }): MailContent {
  return compose(
    `Review requested: ${args.document} (${args.version})`,
    [`${args.requester} asks you to review ${args.version} of "${args.document}".`, "Approve it, or request changes with a comment."],
    args.message || null,
    { href: args.link, label: "Open the review" },
  );
}

export function mentionMail(args: { author: string; document: string; anchor: string; body: string; link: string }): MailContent {
  return compose(
    `${args.author} mentioned you on "${args.document}"`,
    [`${args.author} mentioned you in a comment on ${args.anchor} in "${args.document}".`],
    args.body,
    { href: args.link, label: "Open the thread" },
  );
}

export function verdictMail(args: { reviewer: string; document: string; version: string; verdict: "approve" | "changes_requested"; comment: string; link: string }): MailContent {
  const what = args.verdict === "approve" ? "approved" : "requested changes to";
  return compose(
    `${args.reviewer} ${what} ${args.version} of "${args.document}"`,
    [`${args.reviewer} ${what} ${args.version} of "${args.document}".`],
    args.comment || null,
    { href: args.link, label: "Open the review" },
  );
}
