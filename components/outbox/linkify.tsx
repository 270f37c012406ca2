import type { ReactNode } from "react";

const URL_PATTERN = /(https?:\/\/[^\s<>"')]+)/g;

// Plain-text mail with its http(s) links made clickable. The mail's HTML part is never
// rendered: it comes from outside the app.
export function Linkified({ text }: { text: string }): ReactNode {
  return text.split(URL_PATTERN).map((part, index) =>
    index % 2 === 1 ? (
      <a key={index} href={part} className="break-all font-medium text-electric underline underline-offset-2">
        {part}
      </a>
    ) : (
      <span key={index}>{part}</span>
    ),
  );
}
