import type { MarkRole } from "@/lib/marks/types";

/** Colour and handle letter of each role (LOOK.md): colour is never the only cue. */
export const ROLE_LOOK: Record<MarkRole, { colour: string; letter: string; label: string }> = {
  face: { colour: "#F5A524", letter: "F", label: "Face" },
  target: { colour: "#22B8CF", letter: "T", label: "Target" },
  path: { colour: "#A78BFA", letter: "P", label: "Path" },
  shaft: { colour: "#E2E8F0", letter: "S", label: "Shaft" },
  sole: { colour: "#FB7185", letter: "O", label: "Sole" },
  ground: { colour: "#94A3B8", letter: "G", label: "Ground" },
  ball: { colour: "#FFFFFF", letter: "B", label: "Ball" },
  clubhead: { colour: "#FFFFFF", letter: "C", label: "Clubhead" },
  marker: { colour: "#34D399", letter: "M", label: "Marker" },
};
