// Signing in as a demo user over HTTP, the way a browser does, for the benchmarks.
import { DEMO_SIGN_INS } from "../../lib/seed/demo-sign-ins.mjs";

/** Signs in on `base` (the demo coordinator unless told) and returns the session cookie header. */
export async function sessionCookie(base, email = "dana@quillmoor.example") {
  const jar = new Map();
  const keep = (res) => {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const at = pair.indexOf("=");
      jar.set(pair.slice(0, at), pair.slice(at + 1));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const csrf = await fetch(`${base}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = await csrf.json();
  const form = new URLSearchParams({ csrfToken, email, password: DEMO_SIGN_INS.password, json: "true" });
  keep(
    await fetch(`${base}/api/auth/callback/credentials`, {
      method: "POST",
      body: form,
      headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
      redirect: "manual",
    }),
  );
  if (![...jar.keys()].some((k) => k.includes("session-token"))) throw new Error(`Signing in as ${email} on ${base} failed.`);
  return cookie();
}

/** Runs one autocannon load and resolves with its result, printing nothing. */
export async function load(autocannon, options) {
  return new Promise((resolve, reject) => {
    const instance = autocannon(options, (error, result) => (error ? reject(error) : resolve(result)));
    autocannon.track(instance, { renderProgressBar: false, renderResultsTable: false, renderLatencyTable: false });
  });
}
