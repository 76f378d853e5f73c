"use client";

import { useRouter } from "next/navigation";
import { useCallback, useMemo, useState } from "react";
import type { Vec2 } from "@/lib/geometry/vector";
import { ROLES_BY_VIEW_AND_KIND } from "@/lib/marks/roles";
import { POINTS_PER_KIND, type MarkRole } from "@/lib/marks/types";
import { useQuery } from "@tanstack/react-query";
import { CommentThreads, commentsKey, type CommentList, type Viewer } from "@/components/comments/comment-threads";
import { apiFetch } from "@/lib/client/api";
import type { ChecklistItem } from "@/lib/review/checklist";
import { canRedo, canUndo } from "@/lib/review/history";
import { clampFrame } from "@/lib/review/frames";
import type { KeyCommand } from "@/lib/review/keys";
import { isProposal, moveHandle, type ReviewMark } from "@/lib/review/marks";
import { canAccept } from "@/lib/review/tracking";
import { cancel, DEFAULT_TOOL_OPTIONS, idle, KIND_OF_TOOL, placedPoints, press, type Tool, type ToolOptions, type ToolState } from "@/lib/review/tools";
import { fitViewport, zoomAbout, type Size, type Viewport } from "@/lib/review/viewport";
import type { PuttRef } from "@/lib/review/putts";
import { FrameMarks } from "./frame-marks";
import { FrameStatus } from "./frame-status";
import { FrameStore } from "./frame-store";
import { FrameStrip } from "./frame-strip";
import { HelpDialog } from "./help-dialog";
import { NeedsChecklist } from "./needs-checklist";
import { NoticeBar } from "./notice-bar";
import { Readouts } from "./readouts";
import { ReviewHeader } from "./review-header";
import { StageBox } from "./stage-box";
import { ToolOptionsBar } from "./tool-options";
import { ToolRail } from "./tool-rail";
import { TrackingPanel } from "./tracking-panel";
import { Transport } from "./transport";
import type { ReviewClip } from "./types";
import { useCarryOver } from "./use-carry-over";
import { useMarks } from "./use-marks";
import { useMoments } from "./use-moments";
import { usePlayback } from "./use-playback";
import { useReviewKeys } from "./use-review-keys";
import { useTracking } from "./use-tracking";

/** Marks from other frames still worth seeing: the clip-wide references and nearby track points. */
const isGhost = (m: ReviewMark, frame: number) =>
  m.frame !== frame && (m.role === "target" || m.role === "ground" || m.kind === "scale" || m.kind === "plane" || (m.kind === "point" && Math.abs(m.frame - frame) <= 10));

export function ReviewScreen({ clip, comments, viewer }: { clip: ReviewClip; comments?: CommentList; viewer?: Viewer }) {
  const router = useRouter();
  const store = useMemo(() => new FrameStore(clip.id, clip.frameCount, clip.width, clip.height), [clip.id, clip.frameCount, clip.width, clip.height]);
  const marks = useMarks(clip.id);
  const { moments, setMoment, replaceMoments } = useMoments(clip.id, clip.moments, marks);
  const tracking = useTracking(clip, { reloadMarks: marks.reload, replaceMoments, report: marks.report });
  const [openingFrame] = useState(() => clampFrame(clip.moments.address ?? 0, clip.frameCount));
  const [frame, setFrame] = useState(openingFrame);
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
  const kindRoles: readonly MarkRole[] = kind ? ROLES_BY_VIEW_AND_KIND[clip.view][kind] : [];
  // The ball-track tool makes ball points only: it offers that role and no other.
  const roles: readonly MarkRole[] = tool === "ballTrack" ? ["ball"] : kindRoles;
  const role: MarkRole | null = selected && tool === "select" ? selected.role : tool === "ballTrack" ? "ball" : roles.includes(pickedRole) ? pickedRole : (roles[0] ?? null);
  const available = (t: Tool) => KIND_OF_TOOL[t] === null || ROLES_BY_VIEW_AND_KIND[clip.view][KIND_OF_TOOL[t]!].length > 0;

  const commentData = useQuery({
    queryKey: commentsKey(clip.id),
    queryFn: () => apiFetch<CommentList>(`/api/clips/${clip.id}/comments`),
    initialData: comments,
    enabled: comments !== undefined,
  }).data;
  const commentFrames = (commentData?.threads ?? []).map((t) => ({ id: t.id, frame: t.frame, resolved: t.resolvedAt !== null }));
  const goTo = useCallback((n: number) => setFrame(clampFrame(n, clip.frameCount)), [clip.frameCount]);
  const playback = usePlayback({ captureFps: clip.captureFps, frameCount: clip.frameCount, moments, frame, goTo });
  useCarryOver(clip, marks, openingFrame);
  const step = (by: number) => {
    playback.pause();
    goTo(frame + by);
  };
  const openPutt = (to: PuttRef) => router.push(`/studio/clips/${to.id}`);
  const goToNeed = (item: ChecklistItem) => {
    playback.pause();
    if (item.frame !== null) goTo(item.frame);
    if (item.tool) {
      setSelectedId(null);
      setToolState(idle(item.tool));
      if (item.role) setPickedRole(item.role);
    }
    if (item.hint) marks.inform(item.hint);
  };
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
      case "step": return step(c.by);
      case "first": return step(-frame);
      case "last": return step(clip.frameCount - 1 - frame);
      case "togglePlay": return playback.toggle();
      case "putt": {
        const to = c.by < 0 ? clip.place?.previous : clip.place?.next;
        return to ? openPutt(to) : marks.report(`No ${c.by < 0 ? "earlier" : "later"} putt of this view in the fitting.`);
      }
      case "jump": {
        const n = moments[c.moment] ?? (c.moment === "impact" ? tracking.suggestedImpact : null);
        playback.pause();
        return n === null ? marks.report(`No ${c.moment} frame yet: press Shift+${c.moment === "address" ? "A" : "I"} on it.`) : goTo(n);
      }
      case "setMoment": {
        setMoment(c.moment, frame);
        // Address set and no impact yet: go straight to the suggested impact for the fitter to confirm.
        const suggested = tracking.suggestedImpact;
        if (c.moment === "address" && moments.impact === null && suggested !== null && suggested > frame) {
          playback.pause();
          goTo(suggested);
          marks.inform(`At the suggested impact, frame ${suggested}: press Shift+I to confirm it, or step to the last frame before the ball moves.`);
        }
        return;
      }
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
    <div className="fixed inset-0 z-20 flex flex-col bg-ink text-chalk [&_*:focus-visible]:outline-signal" data-saving={marks.saving ? "1" : "0"} data-playing={playback.playing ? "1" : "0"}>
      <ReviewHeader clip={clip} onPutt={openPutt}>
        <FrameStatus frame={frame} frameCount={clip.frameCount} captureFps={clip.captureFps} moments={moments} suggestedImpact={tracking.suggestedImpact} />
        <span className="ml-auto text-label text-slate-300" aria-live="polite">{marks.saving ? "Saving…" : "All changes saved"}</span>
        <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label disabled:opacity-40" disabled={!canUndo(marks.history)} onClick={marks.undo}>Undo</button>
        <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label disabled:opacity-40" disabled={!canRedo(marks.history)} onClick={marks.redo}>Redo</button>
        <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label" aria-haspopup="dialog" onClick={() => setHelpOpen(true)}>Keys (?)</button>
      </ReviewHeader>
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
        <aside className="flex min-h-0 w-panel shrink-0 flex-col overflow-y-auto border-l border-ink-700 bg-ink-800 [&>*]:shrink-0" data-testid="readout-panel">
          <TrackingPanel tracking={tracking} proposals={proposals} />
          <NeedsChecklist clip={clip} moments={{ address: moments.address, impact: moments.impact, suggestedImpact: tracking.suggestedImpact, frameCount: clip.frameCount }} onGo={goToNeed} />
          <Readouts clip={clip} />
          {comments && viewer && (
            <div className="border-t border-ink-700 bg-chalk p-3 text-ink" data-testid="review-comments">
              <CommentThreads clipId={clip.id} initial={comments} viewer={viewer} frame={frame} onSeek={(n) => {
                playback.pause();
                goTo(n);
              }} />
            </div>
          )}
          <FrameMarks marks={onFrame} acceptedAt={acceptedAt} selectedId={selected?.id ?? null} onSelect={(id) => {
            setToolState(idle("select"));
            setSelectedId(id);
          }} />
        </aside>
      </div>
      <Transport frame={frame} frameCount={clip.frameCount} captureFps={clip.captureFps} playback={playback} onStep={step}
        zoomPercent={Math.round(viewport.scale * 100)} fitted={userViewport === null} />
      <FrameStrip frameCount={clip.frameCount} frame={frame} signal={clip.motionSignal} moments={moments} suggestedImpact={tracking.suggestedImpact} comments={commentFrames} onSeek={(n) => {
        playback.pause();
        goTo(n);
      }} />
      <HelpDialog open={helpOpen} onClose={() => setHelpOpen(false)} />
    </div>
  );
}
