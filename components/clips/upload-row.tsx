"use client";

import type { UploadItem } from "./use-clip-uploads";

const words: Record<UploadItem["status"], string> = { waiting: "waiting", uploading: "uploading", done: "uploaded", failed: "upload failed", cancelled: "cancelled" };

export function UploadRow({ item, onCancel, onRetry }: { item: UploadItem; onCancel: () => void; onRetry: () => void }) {
  const percent = Math.round(item.fraction * 100);
  return (
    <li className="flex flex-col gap-1 py-2" data-upload={item.file.name}>
      <div className="flex items-center gap-3">
        <span className="min-w-0 flex-1 truncate">{item.file.name}</span>
        <span className="num text-label text-slate-600">{item.status === "uploading" ? `${percent}%` : words[item.status]}</span>
        {(item.status === "uploading" || item.status === "waiting") && (
          <button type="button" className="btn-quiet min-h-0 px-2 py-1 text-label" onClick={onCancel}>Cancel</button>
        )}
        {(item.status === "failed" || item.status === "cancelled") && (
          <button type="button" className="btn-quiet min-h-0 px-2 py-1 text-label" onClick={onRetry}>Retry</button>
        )}
      </div>
      <progress className="h-1 w-full accent-signal-dark" max={100} value={percent} aria-label={`${item.file.name} upload`} />
      {item.error && <p className="field-error" role="alert">{item.error}</p>}
    </li>
  );
}
