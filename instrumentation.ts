// Runs once when a server starts: a bad configuration stops it here, with a
// message naming each variable, rather than failing on the first request.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { exitOnBadEnv, exitOutsideFrontDoor } = await import("@/lib/config/exit-on-bad-env");
    exitOnBadEnv();
    exitOutsideFrontDoor();
  }
}
