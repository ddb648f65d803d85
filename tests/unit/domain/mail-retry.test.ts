import { describe, expect, it } from "vitest";
import { afterFailedAttempt, MAIL_RETRY, mailRetryDelayMs } from "@/lib/domain/mail-retry";

describe("mailRetryDelayMs", () => {
  it.each([
    [1, 5_000],
    [2, 10_000],
    [3, 20_000],
    [6, 160_000],
    [7, 320_000],
    [8, 600_000], // 640 s would exceed the 10-minute cap
    [11, 600_000],
  ])("after %i failed tries waits %i ms", (attempts, delayMs) => {
    expect(mailRetryDelayMs(attempts)).toBe(delayMs);
  });

  it("never waits less than the first delay", () => {
    expect(mailRetryDelayMs(0)).toBe(MAIL_RETRY.firstDelayMs);
  });
});

describe("afterFailedAttempt", () => {
  const now = new Date("2026-12-01T12:00:00Z");

  it("schedules the next try from now", () => {
    expect(afterFailedAttempt(1, now)).toEqual({ status: "queued", nextAttemptAt: new Date("2026-12-01T12:00:05Z") });
  });

  it("gives up after the last allowed try", () => {
    expect(afterFailedAttempt(MAIL_RETRY.maxAttempts - 1, now).status).toBe("queued");
    expect(afterFailedAttempt(MAIL_RETRY.maxAttempts, now)).toEqual({ status: "failed" });
  });

  it("keeps trying for some fifty minutes before giving up", () => {
    let totalMs = 0;
    for (let n = 1; n < MAIL_RETRY.maxAttempts; n++) totalMs += mailRetryDelayMs(n);
    expect(totalMs / 60_000).toBeGreaterThan(45);
    expect(totalMs / 60_000).toBeLessThan(60);
  });
});
