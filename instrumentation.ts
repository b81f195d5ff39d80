/** Next's start-up hook: the Node.js server also runs the background jobs (e-mail delivery). */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    // Before any request: the auth rate limit keys on the socket's address, not on headers a
    // client can make up (see lib/auth/client-address.ts).
    const [{ Server }, { installClientAddressStamp }] = await Promise.all([
      import("node:http"),
      import("./lib/auth/client-address"),
    ]);
    installClientAddressStamp(Server);
  }
  if (process.env.NEXT_RUNTIME === "nodejs" && process.env.YOKELINE_JOBS !== "0") {
    const { startBackgroundJobs } = await import("./lib/jobs/start");
    startBackgroundJobs();
  }
}
