// The Joulebook mark: a ledger page whose three rows shrink from fuel through electric to loss,
// the way energy is booked from the tank to the wheels.
export function LogoMark({ size = 28, className }: { size?: number; className?: string }) {
  return (
    <svg
      viewBox="0 0 32 32"
      width={size}
      height={size}
      className={className}
      aria-hidden="true"
      focusable="false"
    >
      <rect x="3" y="2.5" width="26" height="27" rx="5" className="fill-paper-raised stroke-ink" strokeWidth="2" />
      <rect x="8" y="8.5" width="16" height="4" rx="1.5" className="fill-fuel" />
      <rect x="8" y="14" width="11" height="4" rx="1.5" className="fill-electric" />
      <rect x="8" y="19.5" width="5.5" height="4" rx="1.5" className="fill-loss" />
    </svg>
  );
}

export function Wordmark({ className, size = 28 }: { className?: string; size?: number }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className ?? ""}`}>
      <LogoMark size={size} />
      <span className="text-lg font-semibold tracking-tight text-ink">Joulebook</span>
    </span>
  );
}
