// Colour key of the energy paths, in HTML (shared by charts that colour by ledger group).
import { GROUP_DOMAIN, GROUP_RANGE, GROUP_TITLES } from "./theme";

export function GroupLegend({ groups }: { groups?: readonly string[] }) {
  const shown = GROUP_DOMAIN.map((g, i) => ({ g, color: GROUP_RANGE[i]!, title: GROUP_TITLES[i]! })).filter((x) => !groups || groups.includes(x.g));
  return (
    <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft" aria-label="Colour key">
      {shown.map((x) => (
        <li key={x.g} className="flex items-center gap-1.5">
          <span className="inline-block size-2.5 rounded-sm" style={{ backgroundColor: x.color }} aria-hidden="true" />
          {x.title}
        </li>
      ))}
    </ul>
  );
}
