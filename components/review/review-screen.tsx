"use client";

import Link from "next/link";
import { useCallback, useMemo, useState } from "react";
import type { Vec2 } from "@/lib/geometry/vector";
import { ROLES_BY_VIEW_AND_KIND } from "@/lib/marks/roles";
import { POINTS_PER_KIND, type MarkRole } from "@/lib/marks/types";
import { canRedo, canUndo } from "@/lib/review/history";
import { clampFrame } from "@/lib/review/frames";
import type { KeyCommand } from "@/lib/review/keys";
import { isProposal, moveHandle, type ReviewMark } from "@/lib/review/marks";
import { canAccept } from "@/lib/review/tracking";
import { cancel, DEFAULT_TOOL_OPTIONS, idle, KIND_OF_TOOL, placedPoints, press, type Tool, type ToolOptions, type ToolState } from "@/lib/review/tools";
import { fitViewport, zoomAbout, type Size, type Viewport } from "@/lib/review/viewport";
import { FrameMarks } from "./frame-marks";
import { FrameStatus } from "./frame-status";
import { FrameStore } from "./frame-store";
import { FrameStrip } from "./frame-strip";
import { HelpDialog } from "./help-dialog";
import { NoticeBar } from "./notice-bar";
import { Readouts } from "./readouts";
import { StageBox } from "./stage-box";
import { ToolOptionsBar } from "./tool-options";
import { ToolRail } from "./tool-rail";
import { TrackingPanel } from "./tracking-panel";
import type { ReviewClip } from "./types";
import { useMarks } from "./use-marks";
import { useMoments } from "./use-moments";
import { useReviewKeys } from "./use-review-keys";
import { useTracking } from "./use-tracking";

const VIEW_NAME: Record<ReviewClip["view"], string> = { overhead: "Overhead", "face-on": "Face-on", "down-the-line": "Down-the-line" };

/** Marks from other frames still worth seeing: the clip-wide references and nearby track points. */
const isGhost = (m: ReviewMark, frame: number) =>
  m.frame !== frame && (m.role === "target" || m.role === "ground" || m.kind === "scale" || m.kind === "plane" || (m.kind === "point" && Math.abs(m.frame - frame) <= 10));

export function ReviewScreen({ clip }: { clip: ReviewClip }) {
  const store = useMemo(() => new FrameStore(clip.id, clip.frameCount, clip.width, clip.height), [clip.id, clip.frameCount, clip.width, clip.height]);
  const marks = useMarks(clip.id);
  const { moments, setMoment, replaceMoments } = useMoments(clip.id, clip.moments, marks);
  const tracking = useTracking(clip, { reloadMarks: marks.reload, replaceMoments, report: marks.report });
  const [frame, setFrame] = useState(() => clampFrame(clip.moments.address ?? 0, clip.frameCount));
  const [toolState, setToolState] = useState<ToolState>(() => idle("select"));
  const [pickedRole, setPickedRole] = useState<MarkRole>("face");
  const [options, setOptions] = useState<ToolOptions>({ role: "face", ...DEFAULT_TOOL_OPTIONS });
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [userViewport, setUserViewport] = useState<Viewport | null>(null);
  const [stageSize, setStageSize] = useState<Size>({ width: 0, height: 0 });
  const [helpOpen, setHelpOpen] = useState(false);
  const [spaceHeld, setSpaceHeld] = useState(false);

  const image = useMemo(() => ({ width: clip.width, height: clip.height }), [clip.width, clip.height]);
  const fit = fitViewport(image, stageSize);
  const viewport = userViewport ?? fit;
  const tool = toolState.tool;
  // With tracking off the proposals count for nothing, so they are not drawn either.
  const shown = tracking.enabled ? marks.marks : marks.marks.filter((m) => m.source !== "tracked");
  const onFrame = shown.filter((m) => m.frame === frame);
  const ghosts = shown.filter((m) => isGhost(m, frame));
  const selected = onFrame.find((m) => m.id === selectedId) ?? null;
  const kind = selected && tool === "select" ? selected.kind : KIND_OF_TOOL[tool];
  const roles = kind ? ROLES_BY_VIEW_AND_KIND[clip.view][kind] : [];
  const role: MarkRole | null = selected && tool === "select" ? selected.role : tool === "ballTrack" ? "ball" : roles.includes(pickedRole) ? pickedRole : (roles[0] ?? null);
  const available = (t: Tool) => KIND_OF_TOOL[t] === null || ROLES_BY_VIEW_AND_KIND[clip.view][KIND_OF_TOOL[t]!].length > 0;

  const goTo = (n: number) => setFrame(clampFrame(n, clip.frameCount));
  const chooseTool = (t: Tool) => available(t) && setToolState(idle(t));
  const chooseRole = (r: MarkRole) => (selected && tool === "select" ? marks.update(selected.id, { role: r }) : setPickedRole(r));
  const onPress = (p: Vec2) => {
    if (!role) return;
    const step = press(toolState, p, frame, { ...options, role });
    setToolState(step.state);
    if (step.draft) marks.create(step.draft);
    if (step.advanceFrame) goTo(frame + 1);
  };
  const onMoveHandle = (id: string, index: number, to: Vec2) => {
    const mark = marks.marks.find((m) => m.id === id);
    if (mark) marks.update(id, { points: moveHandle(mark.points, index, to) });
  };
  const deleteSelected = () => {
    if (!selected) return;
    marks.destroy(selected.id);
    setSelectedId(null);
  };
  const zoom = (factor: number) => setUserViewport(zoomAbout(viewport, [stageSize.width / 2, stageSize.height / 2], factor, fit.scale));

  const onCommand = (c: KeyCommand) => {
    switch (c.type) {
      case "step": return goTo(frame + c.by);
      case "first": return goTo(0);
      case "last": return goTo(clip.frameCount - 1);
      case "jump": {
        const n = moments[c.moment] ?? (c.moment === "impact" ? tracking.suggestedImpact : null);
        return n === null ? marks.report(`No ${c.moment} frame yet: press Shift+${c.moment === "address" ? "A" : "I"} on it.`) : goTo(n);
      }
      case "setMoment": return setMoment(c.moment, frame);
      case "zoom": return c.by === "fit" ? setUserViewport(null) : zoom(c.by === "in" ? 1.25 : 0.8);
      case "undo": return marks.undo();
      case "redo": return marks.redo();
      case "delete": return deleteSelected();
      case "cancel": return toolState.phase === "placing" ? setToolState(cancel(toolState)) : setSelectedId(null);
      case "tool": return chooseTool(c.tool);
      case "help": return setHelpOpen((o) => !o);
      case "acceptProposals":
        if (tracking.busy) return;
        return canAccept(tracking.enabled, tracking.tracking) ? void tracking.accept() : marks.report("Nothing to accept: no tracked marks are waiting on this clip.");
    }
  };
  useReviewKeys(onCommand, setSpaceHeld, helpOpen);
  const onResize = useCallback((s: Size) => setStageSize(s), []);
  const pointsNeeded = kind && tool !== "select" ? POINTS_PER_KIND[kind] : 0;
  const acceptedAt = tracking.tracking?.acceptedAt ?? null;
  const proposals = shown.filter((m) => isProposal(m, acceptedAt)).length;

  return (
    <div className="fixed inset-0 z-20 flex flex-col bg-ink text-chalk [&_*:focus-visible]:outline-signal" data-saving={marks.saving ? "1" : "0"}>
      <header className="flex items-center gap-4 border-b border-ink-700 px-4 py-2">
        <Link href="/studio" className="text-label text-slate-300 underline-offset-2 hover:underline">← Studio</Link>
        <h1 className="text-body font-semibold">{VIEW_NAME[clip.view]} clip</h1>
        <FrameStatus frame={frame} frameCount={clip.frameCount} captureFps={clip.captureFps} moments={moments} />
        <span className="ml-auto text-label text-slate-300" aria-live="polite">{marks.saving ? "Saving…" : "All changes saved"}</span>
        <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label disabled:opacity-40" disabled={!canUndo(marks.history)} onClick={marks.undo}>Undo</button>
        <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label disabled:opacity-40" disabled={!canRedo(marks.history)} onClick={marks.redo}>Redo</button>
        <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label" aria-haspopup="dialog" onClick={() => setHelpOpen(true)}>Keys (?)</button>
      </header>
      <ToolOptionsBar tool={tool} roles={roles} role={role} onRole={chooseRole} options={options} onOptions={setOptions}
        placed={placedPoints(toolState).length} needed={pointsNeeded} onDelete={selected ? deleteSelected : null} />
      <div className="flex min-h-0 flex-1">
        <ToolRail tool={tool} available={available} onTool={chooseTool} />
        <section className="relative min-w-0 flex-1" aria-label="Frame">
          <StageBox image={image} stage={stageSize} onResize={onResize} store={store} frame={frame} viewport={viewport} fitScale={fit.scale}
            onViewport={setUserViewport} marks={onFrame} ghosts={ghosts} selectedId={selected?.id ?? null} onSelect={setSelectedId}
            tool={tool} placed={placedPoints(toolState)} role={role ?? "face"} planeSizes={options} acceptedAt={acceptedAt} panKey={spaceHeld}
            onPress={onPress} onMoveHandle={onMoveHandle} />
          <NoticeBar notice={marks.notice} onDismiss={marks.dismissNotice} />
        </section>
        <aside className="flex w-panel shrink-0 flex-col border-l border-ink-700 bg-ink-800">
          <TrackingPanel tracking={tracking} proposals={proposals} />
          <Readouts clip={clip} />
          <FrameMarks marks={onFrame} acceptedAt={acceptedAt} selectedId={selected?.id ?? null} onSelect={(id) => {
            setToolState(idle("select"));
            setSelectedId(id);
          }} />
        </aside>
      </div>
      <FrameStrip frameCount={clip.frameCount} frame={frame} signal={clip.motionSignal} moments={moments} suggestedImpact={tracking.suggestedImpact} onSeek={goTo} />
      <HelpDialog open={helpOpen} onClose={() => setHelpOpen(false)} />
    </div>
  );
}
