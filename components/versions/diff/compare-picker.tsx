// Two selects for A and B; a plain GET form, so the resulting address is the shareable link.
export function ComparePicker({ versions, from, to, round }: { versions: { id: string; label: string }[]; from: string; to: string; round?: string }) {
  const options = [...versions.map((v) => ({ value: v.id, label: v.label })), { value: "live", label: "Live document" }];
  const select = (name: string, label: string, value: string) => (
    <label className="flex flex-col gap-1 text-sm font-medium">
      {label}
      <select name={name} defaultValue={value} className="rounded-control border border-rule-strong bg-paper-raised px-3 py-2 font-normal">
        {options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}
      </select>
    </label>
  );
  return (
    <form method="get" className="mb-gutter flex flex-wrap items-end gap-3" aria-label="Choose what to compare">
      {select("from", "A (from)", from)}
      {select("to", "B (to)", to)}
      {round ? <input type="hidden" name="round" value={round} /> : null}
      <button type="submit" className="rounded-control border border-rule-strong bg-paper-raised px-4 py-2 text-sm font-medium hover:bg-paper-sunk">Compare</button>
    </form>
  );
}
