import { describe, expect, test } from "vitest";
import { decideSignIn, pauseSeconds, SIGN_IN_THROTTLE as T, throttleMessage, type RecentFailures } from "@/lib/domain/sign-in-throttle";

// The rule follows the OWASP Authentication Cheat Sheet ("Protect Against Automated Attacks"):
// growing delays instead of a lockout anyone can trigger, limits per source address, and no
// penalty on the account's owner from an address they have used.
const now = new Date("2026-12-05T12:00:00Z");
const secondsAgo = (s: number) => new Date(now.getTime() - s * 1000);
const quiet: RecentFailures = {
  pair: { count: 0, latestAt: null },
  account: { count: 0, latestAt: null },
  address: { count: 0, oldestCountedAt: null },
  knownAddress: false,
};

describe("pauseSeconds", () => {
  test.each([
    [0, 0],
    [T.freePairFailures - 1, 0],
    [T.freePairFailures, 2],
    [T.freePairFailures + 1, 4],
    [T.freePairFailures + 4, 32],
    [T.freePairFailures + 5, 60],
    [T.freePairFailures + 500, 60],
  ])("%i failures → %i s", (failures, seconds) => expect(pauseSeconds(failures, T.freePairFailures)).toBe(seconds));
});

describe("decideSignIn", () => {
  test("no failures: allowed", () => expect(decideSignIn(quiet, now)).toEqual({ allowed: true }));

  test("a pair past its free tries waits out the pause since its last failure, then may try again", () => {
    const recent = { ...quiet, pair: { count: T.freePairFailures + 1, latestAt: secondsAgo(1) } };
    expect(decideSignIn(recent, now)).toEqual({ allowed: false, waitSeconds: 3, reason: "pair" });
    expect(decideSignIn({ ...recent, pair: { ...recent.pair, latestAt: secondsAgo(4) } }, now)).toEqual({ allowed: true });
  });

  test("the pause never exceeds the cap, however many failures", () => {
    const decision = decideSignIn({ ...quiet, pair: { count: 10_000, latestAt: now } }, now);
    expect(decision).toMatchObject({ allowed: false, waitSeconds: T.maxPauseSeconds });
  });

  test("distributed guessing pauses an unknown address but not a known one", () => {
    const recent = { ...quiet, account: { count: T.accountAlarmFailures + 2, latestAt: secondsAgo(1) } };
    expect(decideSignIn(recent, now)).toMatchObject({ allowed: false, reason: "account" });
    expect(decideSignIn({ ...recent, knownAddress: true }, now)).toEqual({ allowed: true });
  });

  test("failures below the alarm from many addresses pause nobody", () => {
    expect(decideSignIn({ ...quiet, account: { count: T.accountAlarmFailures - 1, latestAt: now } }, now)).toEqual({ allowed: true });
  });

  test("an address over its limit waits until its oldest counted failure leaves the window", () => {
    const recent = { ...quiet, address: { count: T.maxAddressFailures, oldestCountedAt: secondsAgo(T.windowMinutes * 60 - 30) } };
    expect(decideSignIn(recent, now)).toEqual({ allowed: false, waitSeconds: 30, reason: "address" });
    expect(decideSignIn({ ...recent, address: { ...recent.address, oldestCountedAt: secondsAgo(T.windowMinutes * 60 + 1) } }, now)).toEqual(
      { allowed: true },
    );
  });
});

describe("throttleMessage", () => {
  test.each([
    [{ allowed: false, waitSeconds: 1, reason: "pair" } as const, /Try again in 1 second\. The account is not locked\./],
    [{ allowed: false, waitSeconds: 16, reason: "pair" } as const, /16 seconds/],
    [{ allowed: false, waitSeconds: 40, reason: "account" } as const, /from a device you have signed in with before/],
    [{ allowed: false, waitSeconds: 600, reason: "address" } as const, /Try again in 10 minutes\./],
  ])("%o", (decision, pattern) => expect(throttleMessage(decision)).toMatch(pattern));
});
