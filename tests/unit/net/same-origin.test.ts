import { describe, expect, test } from "vitest";
import { isSameOrigin } from "@/lib/net/same-origin";

// The Origin header (RFC 6454 §7; Fetch Standard) is set by the browser and cannot be changed by a
// page's script; OWASP's CSRF Prevention Cheat Sheet, "Verifying Origin With Standard Headers".
const app = { appUrl: "http://127.0.0.1:3100", host: "127.0.0.1:3100" };

describe("isSameOrigin", () => {
  test.each([
    ["http://127.0.0.1:3100", app, true],
    ["http://localhost:3000", { appUrl: "http://127.0.0.1:3000", host: "localhost:3000" }, true],
    ["https://permits.example.com", { appUrl: "https://permits.example.com", host: "10.0.0.5:3000" }, true],
    ["http://127.0.0.1:3101", app, false],
    ["http://evil.example", app, false],
    ["http://127.0.0.1:3100.evil.example", app, false],
    ["null", app, false],
    [null, app, false],
    ["not a url", app, false],
    ["file://127.0.0.1:3100", app, false],
  ])("%s → %s", (origin, where, want) => expect(isSameOrigin(origin as string | null, where)).toBe(want));
});
