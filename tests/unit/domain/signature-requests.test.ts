// The pure rules of signature requests: when a link counts as expired, and when a confirmed name is the
// name the signer was asked under. Our own rules (no outside source): each row says what it guards.
import { describe, expect, test } from "vitest";
import { isAwaitingSignature, isSameName, signerState } from "@/lib/domain/signature-requests";

const NOW = new Date("2026-12-05T12:00:00Z");

describe("signerState", () => {
  test.each([
    { status: "sent", expiresAt: "2026-12-06T00:00:00Z", state: "sent", why: "open link before its expiry" },
    { status: "opened", expiresAt: "2026-12-05T12:00:00Z", state: "expired", why: "expiry is exclusive: at the instant it ends" },
    { status: "sent", expiresAt: "2026-12-01T00:00:00Z", state: "expired", why: "unanswered past its expiry" },
    { status: "signed", expiresAt: "2026-12-01T00:00:00Z", state: "signed", why: "an answer outlives the expiry" },
    { status: "declined", expiresAt: "2026-12-01T00:00:00Z", state: "declined", why: "a refusal outlives the expiry" },
    { status: "revoked", expiresAt: "2026-12-31T00:00:00Z", state: "revoked", why: "withdrawn stays withdrawn" },
    { status: "sent", expiresAt: null, state: "sent", why: "an in-person signer has no expiry" },
  ] as const)("$status until $expiresAt → $state ($why)", ({ status, expiresAt, state }) => {
    expect(signerState({ status, expiresAt }, NOW)).toBe(state);
  });

  test.each([
    ["sent", true],
    ["opened", true],
    ["expired", false],
    ["signed", false],
    ["declined", false],
    ["revoked", false],
  ] as const)("%s awaits a signature: %s", (state, awaiting) => {
    expect(isAwaitingSignature(state)).toBe(awaiting);
  });
});

describe("isSameName", () => {
  test.each([
    ["Imogen Farrow-Lake", "imogen farrow-lake", true],
    ["Imogen Farrow-Lake", "  Imogen   Farrow-Lake ", true],
    ["Zoë Quill", "ZOË QUILL", true],
    ["Imogen Farrow-Lake", "Imogen Farrow", false],
    ["Imogen Farrow-Lake", "", false],
    ["Imogen Farrow-Lake", "   ", false],
  ])("%j confirmed as %j → %s", (asked, confirmed, same) => {
    expect(isSameName(asked, confirmed)).toBe(same);
  });
});
