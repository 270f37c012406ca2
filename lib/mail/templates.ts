// Our e-mails: plain text first (what most tests and many engineers read), simple HTML beside it.
export type MailContent = { subject: string; text: string; html: string };

export function escapeHtml(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

function layout(paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 14px">${escapeHtml(p)}</p>`).join("\n");
  return `<!doctype html>
<html><body style="margin:0;padding:24px;background:#f6f1e7;color:#1f1d1a;font-family:system-ui,sans-serif;font-size:15px;line-height:1.5">
<div style="max-width:520px;margin:0 auto;background:#fffdf8;border:1px solid #e3dccd;border-radius:8px;padding:24px">
<p style="margin:0 0 18px;font-weight:600;letter-spacing:.02em">Joulebook</p>
${body}
<p style="margin:20px 0"><a href="${escapeHtml(link.href)}" style="background:#1f1d1a;color:#fffdf8;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(link.label)}</a></p>
<p style="margin:0;color:#6b665c;font-size:13px">Or paste this address into your browser:<br>${escapeHtml(link.href)}</p>
</div></body></html>`;
}

const ROLE_WORDS: Record<string, string> = {
  owner: "an owner (manages members and everything else)",
  editor: "an editor (builds and changes scenarios)",
  reviewer: "a reviewer (reads, comments and gives verdicts)",
  viewer: "a viewer (reads scenarios and versions)",
};

export function invitationMail(args: {
  workspaceName: string;
  inviterName: string;
  role: string;
  link: string;
  expiresAt: Date;
}): MailContent {
  const role = ROLE_WORDS[args.role] ?? args.role;
  const until = args.expiresAt.toISOString().slice(0, 10);
  const lines = [
    `${args.inviterName} asks you to join the workspace "${args.workspaceName}" on Joulebook as ${role}.`,
    `The link works once and until ${until}. Sign in or create an account with this e-mail address, then accept.`,
    "If you did not expect this, ignore this message; nothing happens unless the link is used.",
  ];
  return {
    subject: `Join "${args.workspaceName}" on Joulebook`,
    text: `${lines[0]}\n\nAccept the invitation:\n${args.link}\n\n${lines[1]}\n\n${lines[2]}\n`,
    html: layout(lines, { href: args.link, label: "Accept the invitation" }),
  };
}

export function passwordResetMail(args: { name: string; link: string }): MailContent {
  const lines = [
    `Hello ${args.name}, someone (hopefully you) asked to set a new Joulebook password for this address.`,
    "The link works once, for one hour. Setting a new password signs you out everywhere.",
    "If you did not ask for this, ignore this message; your password stays as it is.",
  ];
  return {
    subject: "Set a new Joulebook password",
    text: `${lines[0]}\n\nChoose a new password:\n${args.link}\n\n${lines[1]}\n\n${lines[2]}\n`,
    html: layout(lines, { href: args.link, label: "Choose a new password" }),
  };
}
