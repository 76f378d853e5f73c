import { redirect } from "next/navigation";
import { currentActor } from "@/lib/server/auth/actor";

// The front door: each role lands on its own home.
export default async function Home() {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in");
  redirect(actor.role === "golfer" ? "/me" : "/studio");
}
