/** Next's start-up hook: the Node.js server also runs the background jobs (e-mail delivery). */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.YOKELINE_JOBS !== "0") {
    const { startBackgroundJobs } = await import("./lib/jobs/start");
    startBackgroundJobs();
  }
}
