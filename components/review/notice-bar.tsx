import type { Notice } from "./use-marks";

/** Conflicts, save errors and what the screen did by itself, announced and kept in view until dismissed. */
export function NoticeBar({ notice, onDismiss }: { notice: Notice; onDismiss: () => void }) {
  return (
    <div role="status" aria-live="assertive" className="pointer-events-none absolute inset-x-0 top-0 z-10 flex justify-center p-2">
      {notice && (
        <p className={`pointer-events-auto flex items-center gap-3 rounded-card px-4 py-2 text-body shadow ${notice.tone !== "error" ? "bg-chalk text-ink" : "bg-signal-light text-ink"}`}>
          <span data-testid="notice">{notice.text}</span>
          <button type="button" className="text-label underline" onClick={onDismiss}>Dismiss</button>
        </p>
      )}
    </div>
  );
}
