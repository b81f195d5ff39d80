/**
 * Next's start-up hook. A production run with unsafe settings stops here (each one named), before
 * the server takes a request; otherwise the Node.js server also runs the background jobs.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { refuseUnsafeProduction } = await import("./lib/config/production");
  refuseUnsafeProduction(process.env, "Yokeline");
  // Before any request: the auth rate limit keys on the socket's address, not on headers a
  // client can make up (see lib/auth/client-address.ts).
  const [{ Server }, { installClientAddressStamp }] = await Promise.all([
    import("node:http"),
    import("./lib/auth/client-address"),
  ]);
  installClientAddressStamp(Server);
  if (process.env.YOKELINE_JOBS !== "0") {
    const { startBackgroundJobs } = await import("./lib/jobs/start");
    startBackgroundJobs();
  }
}
