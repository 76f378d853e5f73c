export { meanAbsoluteDifference, MotionSignalBuilder, motionSignal } from "./signal";
export { suggestImpactFrame, persistentRise, MIN_STRENGTH, type ImpactSuggestion } from "./impact";
