// Form-level messages (server refusals, throttling, success). The live region is always in the
// page so screen readers announce the text when it arrives.
export function FormMessage({ error, success }: { error?: string; success?: string }) {
  return (
    <div aria-live="polite" aria-atomic="true">
      {error ? (
        <p role="alert" className="rounded-control border border-danger/40 bg-danger-soft px-3 py-2 text-sm text-danger">
          {error}
        </p>
      ) : success ? (
        <p className="rounded-control border border-ok/40 bg-ok-soft px-3 py-2 text-sm text-ok">{success}</p>
      ) : null}
    </div>
  );
}
