"use client";

import { useEffect, useRef } from "react";
import { KEY_HELP } from "@/lib/review/keys";

/** The `?` overlay: every key of the review screen, as a modal dialog. */
export function HelpDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog ref={ref} onClose={onClose} aria-labelledby="help-heading" className="m-auto w-[32rem] max-w-[92vw] rounded-card bg-ink-800 p-6 text-chalk backdrop:bg-ink/70">
      <h2 id="help-heading" className="text-title">Keyboard</h2>
      <table className="mt-4 w-full text-body">
        <tbody>
          {KEY_HELP.map((k) => (
            <tr key={k.keys} className="border-b border-ink-700">
              <th scope="row" className="py-1.5 pr-4 text-left font-mono text-label text-signal-light">{k.keys}</th>
              <td className="py-1.5">{k.does}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <button type="button" className="btn-quiet mt-5" onClick={onClose} autoFocus>Close</button>
    </dialog>
  );
}
