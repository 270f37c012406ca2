// The state of a review round as a small badge (document page, documents table, reviews page).
const STYLE = {
  open: { text: "in review", cls: "bg-electric-soft text-electric" },
  approved: { text: "approved", cls: "bg-ok-soft text-ok" },
  changes_requested: { text: "changes requested", cls: "bg-danger-soft text-danger" },
} as const;

export type ReviewStateName = keyof typeof STYLE;

export function ReviewStateBadge({ state, prefix }: { state: ReviewStateName; prefix?: string }) {
  const s = STYLE[state];
  return <span data-review-state={state} className={`inline-block rounded-full px-2.5 py-0.5 text-xs font-medium ${s.cls}`}>{prefix ? `${prefix} ` : ""}{s.text}</span>;
}
