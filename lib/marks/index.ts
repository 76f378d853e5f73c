export * from "./types";
export { markInputSchema, type ParsedMarkInput } from "./schema";
export { checkMarkAgainstClip } from "./check";
export { ROLES_BY_VIEW_AND_KIND, roleFits } from "./roles";
