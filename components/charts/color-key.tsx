// A colour key in HTML for charts whose legend would take room from the plot or be clipped:
// one swatch and label per item, wrapping under the chart. The swatch follows the mark: a short
// line for line charts, a dot for point clouds.
export interface KeyItem {
  label: string;
  color: string;
  shape?: "line" | "dot";
}

const SWATCH = { line: "h-1 w-4 rounded-sm", dot: "size-2 rounded-full" } as const;

export function ColorKey({ items, label = "Colour key" }: { items: readonly KeyItem[]; label?: string }) {
  return (
    <ul className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft" aria-label={label}>
      {items.map((x) => (
        <li key={x.label} className="flex items-center gap-1.5">
          <span className={`inline-block ${SWATCH[x.shape ?? "line"]}`} style={{ backgroundColor: x.color }} aria-hidden="true" />
          {x.label}
        </li>
      ))}
    </ul>
  );
}
