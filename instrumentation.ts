// Runs once when a server instance starts: the background workers live beside the app.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startWorkers } = await import("@/lib/jobs/worker");
  await startWorkers().catch((error) => console.error("[tankwright] the background workers did not start", error));
}
