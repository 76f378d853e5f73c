import "server-only";
// Pages only: kept apart from access.ts so that the worker and scripts, which share the data
// layer, never load Next's navigation (it needs React's client half).
import { redirect } from "next/navigation";
import { currentActor, type SignedInActor } from "./auth/actor";

/** The actor, or a redirect to the sign-in page. */
export async function requirePageActor(): Promise<SignedInActor> {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in");
  return actor;
}
