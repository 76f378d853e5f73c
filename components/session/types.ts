// The session's JSON as the browser receives it (GET /api/fittings/{id}/session, lib/server/dal/session.ts).
import type { Session } from "@/lib/server/dal/session";

type Jsonified<T> = T extends Date ? string : T extends (infer U)[] ? Jsonified<U>[] : T extends object ? { [K in keyof T]: Jsonified<T[K]> } : T;

export type SessionData = Jsonified<Session>;
export type SessionBuild = SessionData["builds"][number];
export type SessionPutt = SessionBuild["putts"][number];
export type SessionNumber = SessionPutt["numbers"][number];
export type SessionStat = SessionBuild["summary"][number];
