import { redirect } from "next/navigation";
import { getActor } from "@/lib/auth/actor";
import { homePath } from "@/lib/auth/roles";

export const dynamic = "force-dynamic";

export default async function Home() {
  const actor = await getActor();
  redirect(actor ? homePath(actor.memberships) : "/sign-in");
}
