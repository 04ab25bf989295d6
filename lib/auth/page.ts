import "server-only";
import { headers } from "next/headers";
import { notFound, redirect } from "next/navigation";
import { AppError } from "@/lib/errors";
import { getActor, type TActor } from "./actor";

/** For pages: the signed-in user, or a redirect to sign-in that returns here afterwards. */
export async function pageActor(): Promise<TActor> {
  const actor = await getActor();
  if (!actor) {
    const path = (await headers()).get("x-tankwright-path") ?? "/";
    redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  }
  return actor;
}

/**
 * For pages: runs an authorization call; a record the user may not see (another
 * vessel, another company, or a role that does not allow it) is a 404 page.
 */
export async function pageAuthorize<T>(check: () => Promise<T>): Promise<T> {
  try {
    return await check();
  } catch (error) {
    if (error instanceof AppError && (error.code === "not_found" || error.code === "forbidden")) notFound();
    if (error instanceof AppError && error.code === "unauthenticated") redirect("/sign-in");
    throw error;
  }
}
