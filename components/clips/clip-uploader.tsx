"use client";

import { useState } from "react";
import { useDropzone } from "react-dropzone";
import { VIEWS, type View } from "@/lib/marks/types";
import { StrokePicker, useStrokeChoice } from "./stroke-picker";
import { UploadRow } from "./upload-row";
import { useClipUploads } from "./use-clip-uploads";

export type ClipUploaderProps = {
  fittingId: string;
  builds: { id: string; label: string }[];
  consentConfirmed: boolean;
  cameraFps: Record<View, number>;
};

/** Drop clips into a build and a view; each file goes straight to the store with its own progress. */
export function ClipUploader({ fittingId, builds, consentConfirmed, cameraFps }: ClipUploaderProps) {
  const [buildId, setBuildId] = useState(builds[0]?.id ?? "");
  const [view, setView] = useState<View>("overhead");
  const [fps, setFps] = useState<Record<View, number>>(cameraFps);
  const [consent, setConsent] = useState(consentConfirmed);
  const uploads = useClipUploads(fittingId);
  const stroke = useStrokeChoice(buildId);
  const ready = Boolean(buildId) && consent && fps[view] > 0;
  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    accept: { "video/*": [".mp4", ".mov", ".m4v", ".avi", ".mkv"] },
    multiple: true,
    disabled: !ready,
    onDropAccepted: async (files) => {
      const strokeId = await stroke.resolve(files.length);
      if (strokeId === undefined) return;
      uploads.add(files, { fittingId, buildId, view, captureFps: fps[view], consentConfirmed: consent, strokeId: strokeId ?? undefined });
    },
  });

  if (builds.length === 0) return <p className="text-slate-600">Add a build first: every clip belongs to one.</p>;
  return (
    <section className="flex flex-col gap-3" aria-label="Upload clips">
      <div className="grid gap-3 sm:grid-cols-3">
        <label className="flex flex-col">
          <span className="field-label">Build</span>
          <select className="field" value={buildId} onChange={(e) => setBuildId(e.target.value)}>
            {builds.map((b) => <option key={b.id} value={b.id}>{b.label}</option>)}
          </select>
        </label>
        <label className="flex flex-col">
          <span className="field-label">View</span>
          <select className="field" value={view} onChange={(e) => setView(e.target.value as View)}>
            {VIEWS.map((v) => <option key={v} value={v}>{v}</option>)}
          </select>
        </label>
        <label className="flex flex-col">
          <span className="field-label">Capture rate (frames/s)</span>
          <input className="field num" type="number" min={1} max={10000} value={fps[view]} onChange={(e) => setFps({ ...fps, [view]: Number(e.target.value) })} />
        </label>
      </div>
      <p className="text-label text-slate-600">The camera&apos;s rate, not the file&apos;s: slow-motion files play slower than they were filmed.</p>
      <StrokePicker choice={stroke} />
      {!consentConfirmed && (
        <label className="flex items-start gap-2">
          <input type="checkbox" className="mt-1" checked={consent} onChange={(e) => setConsent(e.target.checked)} />
          <span>The golfer (a parent or guardian for a minor) agreed to be filmed for this fitting; clips stay private to the studio and the golfer.</span>
        </label>
      )}
      <div
        {...getRootProps({
          className: `rounded-card border-2 border-dashed p-6 text-center ${ready ? "cursor-pointer border-slate-400 hover:border-ink" : "border-slate-200 text-slate-500"} ${isDragActive ? "border-signal-dark bg-signal-light" : ""}`,
        })}
      >
        <input {...getInputProps()} aria-label="Clip files" />
        {ready ? "Drop clips here, or click to choose files" : "Confirm consent to video to upload clips"}
      </div>
      {uploads.items.length > 0 && (
        <ul className="divide-y divide-chalk-200">
          {uploads.items.map((item) => (
            <UploadRow key={item.key} item={item} onCancel={() => uploads.cancel(item.key)} onRetry={() => uploads.retry(item)} />
          ))}
        </ul>
      )}
    </section>
  );
}
