// The clip page shared by the golfer (/me/clips/[id]) and the coach (/studio/coach/clips/[id]).
import Link from "next/link";
import type { SignedInActor } from "@/lib/server/access";
import type { PhoneClip } from "@/lib/server/dal/golfer-clips";
import type { PlayerMark } from "./draw-marks";
import { MeasurementList } from "./measurement-list";
import { PhoneClipView } from "./phone-clip-view";

const viewWords = { overhead: "Overhead", "face-on": "Face-on", "down-the-line": "Down the line" } as const;

export function PhoneClipPage({ data, actor, back }: { data: PhoneClip; actor: SignedInActor; back: { href: string; label: string } }) {
  const { clip, build, marks, measurements, comments } = data;
  const ready = clip.state === "ready" && clip.width && clip.height && clip.frameCount;
  // Dates cross to the client as strings.
  const initial = JSON.parse(JSON.stringify({ captureFps: comments.captureFps, threads: comments.threads }));
  return (
    <div className="mx-auto flex w-full max-w-xl flex-col gap-4">
      <header>
        <p className="text-label text-slate-600"><Link href={back.href} className="inline-flex min-h-touch items-center underline-offset-2 hover:underline">← {back.label}</Link></p>
        <h1 className="text-title">{viewWords[clip.view]} · {build.label}</h1>
      </header>
      {ready ? (
        <PhoneClipView
          clip={{ id: clip.id, width: clip.width!, height: clip.height!, frameCount: clip.frameCount!, captureFps: clip.captureFps, slowMotionFactor: clip.slowMotionFactor, moments: clip.moments }}
          marks={marks.map((m) => ({ id: m.id, frame: m.frame, kind: m.kind, role: m.role, points: m.points as [number, number][] }))}
          comments={initial}
          viewer={{ userId: actor.userId, role: actor.role }}
        >
          <MeasurementList measurements={measurements} view={clip.view} handedness={clip.handedness} />
        </PhoneClipView>
      ) : (
        <p className="card">This clip is not ready to play ({clip.state.replace("_", " ")}).</p>
      )}
    </div>
  );
}

export type { PlayerMark };
