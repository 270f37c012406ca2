// A comment body with its light formatting, rendered as React elements: user text is never
// interpreted as HTML.
import { parseMarkup } from "@/lib/versions/markup";

export function Markup({ body }: { body: string }) {
  return (
    <span className="whitespace-pre-wrap break-words">
      {parseMarkup(body).map((t, i) => {
        switch (t.type) {
          case "bold": return <strong key={i}>{t.text}</strong>;
          case "italic": return <em key={i}>{t.text}</em>;
          case "code": return <code key={i} className="rounded bg-paper-sunk px-1 font-mono text-[0.9em]">{t.text}</code>;
          case "link": return <a key={i} href={t.href} rel="noopener noreferrer nofollow" target={t.href.startsWith("/") ? undefined : "_blank"} className="underline">{t.text}</a>;
          case "mention": return <span key={i} className="rounded bg-electric-soft px-1 font-medium text-electric">{t.text}</span>;
          default: return <span key={i}>{t.text}</span>;
        }
      })}
    </span>
  );
}
