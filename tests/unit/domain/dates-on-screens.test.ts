import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { localIsoDate } from "@/lib/domain/time-zones";
import { documentDate } from "@/lib/documents/text";

// Every date a user sees is the organization's calendar day. Cutting an ISO timestamp to its first
// ten characters gives the UTC day, which in the evening in America is already tomorrow.

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? sources(full) : /\.(ts|tsx)$/.test(name) ? [full] : [];
  });
}

describe("dates in the organization's zone", () => {
  test("no code that renders or mails takes the UTC day of a timestamp", () => {
    const files = ["app", "components", "templates", "lib/documents", "lib/field", "lib/server", "lib/fees"].flatMap(sources);
    const offenders = files.filter((file) =>
      /toISOString\(\)\.slice\(0, ?10\)|At\??\.slice\(0, ?10\)|toISOString\(\)\.split\("T"\)/.test(readFileSync(file, "utf8")),
    );
    expect(offenders).toEqual([]);
  });

  test.each([
    // 7:30 pm in Denver on December 4 (MST, UTC−7) is 02:30 UTC on December 5 (IANA tz database).
    ["2026-12-05T02:30:00Z", "America/Denver", "2026-12-04"],
    ["2026-12-05T02:30:00Z", "America/New_York", "2026-12-04"],
    ["2026-12-05T06:30:00Z", "America/New_York", "2026-12-05"],
    // Summer: MDT is UTC−6.
    ["2026-07-01T05:59:00Z", "America/Denver", "2026-06-30"],
    ["2026-07-01T06:00:00Z", "America/Denver", "2026-07-01"],
    ["2026-12-05T09:59:00Z", "Pacific/Honolulu", "2026-12-04"],
  ])("%s in %s is dated %s", (iso, zone, day) => {
    expect(documentDate(iso, zone)).toBe(day);
    expect(localIsoDate(iso, zone)).toBe(day);
  });
});
