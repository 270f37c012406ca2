import { sentence } from "./sentence";

// Form-level messages (server refusals, throttling, success). The live region is always in the
// page; the messages themselves carry role alert/status, so they are announced even though the
// empty region takes no room.
export function FormMessage({ error, success }: { error?: string; success?: string }) {
  return (
    <div aria-live="polite" aria-atomic="true" className="empty:hidden">
      {error ? (
        <p role="alert" className="rounded-control border border-danger/40 bg-danger-soft px-3 py-2 text-sm text-danger">
          {sentence(error)}
        </p>
      ) : success ? (
        <p role="status" className="rounded-control border border-ok/40 bg-ok-soft px-3 py-2 text-sm text-ok">{sentence(success)}</p>
      ) : null}
    </div>
  );
}
