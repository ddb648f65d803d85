import { DEMO_SIGN_INS } from "@/lib/seed/demo-sign-ins.mjs";

/** A small HTTP client with a cookie jar, speaking to one app server as a browser's scripts would (same-origin Origin). */
export class AppClient {
  private cookies = new Map<string, string>();
  constructor(readonly base: string) {}

  async request(path: string, init: RequestInit & { json?: unknown } = {}): Promise<Response> {
    const headers = new Headers(init.headers);
    headers.set("origin", this.base);
    if (this.cookies.size) headers.set("cookie", [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; "));
    let body = init.body;
    if (init.json !== undefined) {
      headers.set("content-type", "application/json");
      body = JSON.stringify(init.json);
    }
    const res = await fetch(`${this.base}${path}`, { ...init, headers, body, redirect: "manual" });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const at = pair!.indexOf("=");
      this.cookies.set(pair!.slice(0, at).trim(), pair!.slice(at + 1).trim());
    }
    return res;
  }

  async json<T = any>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<{ status: number; body: T }> {
    const res = await this.request(path, init);
    const text = await res.text();
    let body: unknown = text;
    try {
      body = JSON.parse(text);
    } catch {
      // not JSON: kept as text
    }
    return { status: res.status, body: body as T };
  }

  /** The jar's cookies as a browser context takes them. */
  cookieList() {
    const { hostname } = new URL(this.base);
    return [...this.cookies].map(([name, value]) => ({ name, value, domain: hostname, path: "/" }));
  }

  /** Signs in through next-auth's credentials endpoint; answers the error text next-auth passes back, or null. */
  async signIn(email: string, password: string = DEMO_SIGN_INS.password): Promise<string | null> {
    const { body } = await this.json<{ csrfToken: string }>("/api/auth/csrf");
    const form = new URLSearchParams({ csrfToken: body.csrfToken, email, password, json: "true" });
    const res = await this.request("/api/auth/callback/credentials", {
      method: "POST",
      body: form,
      headers: { "content-type": "application/x-www-form-urlencoded" },
    });
    const answer = await res.text();
    const url = (() => {
      try {
        return new URL(JSON.parse(answer).url);
      } catch {
        return null;
      }
    })();
    return url?.searchParams.get("error") ?? null;
  }
}

/** Polls until `check` passes or the time is up; the last failure is thrown. */
export async function eventually<T>(check: () => Promise<T>, { timeoutMs = 60_000, intervalMs = 500 } = {}): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      return await check();
    } catch (error) {
      if (Date.now() > deadline) throw error;
      await new Promise((r) => setTimeout(r, intervalMs));
    }
  }
}
