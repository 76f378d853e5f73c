// The invented demo scenario (no real studio, person or putter model).
import type { StudioSettings, GolferIntake } from "@/db/schema";

export const DEMO_PASSWORD = "fitframe-demo";
// Demo only: printed by the README so the upload script can be tried at once.
export const DEMO_TOKEN = "ff_demo_capture_token_local_only_0001";

export const defaultStudioSettings: StudioSettings = {
  units: "ft",
  frictionMu: 0.2,
  windows: {
    aim: { min: -1, max: 1 },
    face_angle_impact: { min: -1, max: 1 },
    path: { min: -2, max: 2 },
    start_direction: { min: -1, max: 1 },
    shaft_lean_impact: { min: 0, max: 4 },
    launch_angle: { min: 1, max: 3 },
  },
  cameraFps: { overhead: 240, "face-on": 240, "down-the-line": 240 },
};

export const DEMO_STUDIO = { name: "Harrowgate Lane Putting Room", slug: "harrowgate-lane", timeZone: "Europe/London" };

type DemoBuild = { label: string; isBaseline?: boolean; headModel: string; neckStyle: string; lengthIn: number; lieDeg: number; loftDeg: number; headMassG: number; gripName: string; gripMassG: number };

type DemoUser = {
  email: string;
  name: string;
  role: "admin" | "fitter" | "coach" | "golfer";
  handedness?: "right" | "left";
  isMinor?: boolean;
  intake?: GolferIntake;
  builds?: DemoBuild[];
};

export const DEMO_USERS: DemoUser[] = [
  { email: "admin@harrowgate.test", name: "Priya Aldous", role: "admin" },
  { email: "fitter@harrowgate.test", name: "Callum Reyes-Hart", role: "fitter" },
  { email: "fitter2@harrowgate.test", name: "Ines Whitcombe", role: "fitter" },
  { email: "coach@harrowgate.test", name: "Dougal Fenn", role: "coach" },
  {
    email: "golfer@harrowgate.test", name: "Maren Okonkwo", role: "golfer", handedness: "right",
    intake: { puttingStyle: "arc", usualMiss: "pushes short putts", ball: "urethane tour ball", greenSpeedFt: 10, currentPutter: { headStyle: "blade", lengthIn: 35, lieDeg: 70, loftDeg: 3 } },
    builds: [
      { label: "Own putter", isBaseline: true, headModel: "Own blade (as brought)", neckStyle: "plumber's neck", lengthIn: 35, lieDeg: 70, loftDeg: 3, headMassG: 340, gripName: "pistol, standard", gripMassG: 60 },
      { label: "Mallet, shorter", headModel: "Studio mallet M2", neckStyle: "short slant", lengthIn: 34, lieDeg: 70, loftDeg: 3, headMassG: 355, gripName: "pistol, midsize", gripMassG: 85 },
    ],
  },
  {
    email: "golfer2@harrowgate.test", name: "Tobias Lindgren", role: "golfer", handedness: "left",
    intake: { puttingStyle: "straight back, straight through", usualMiss: "pulls", greenSpeedFt: 9 },
    builds: [{ label: "Own putter", isBaseline: true, headModel: "Own mallet (as brought)", neckStyle: "face-balanced shaft bend", lengthIn: 34, lieDeg: 71, loftDeg: 2.5, headMassG: 350, gripName: "flat-front, oversize", gripMassG: 120 }],
  },
  { email: "golfer3@harrowgate.test", name: "Ada Quill", role: "golfer", handedness: "right", isMinor: true, intake: { notes: "Junior; guardian present at the fitting." } },
];
