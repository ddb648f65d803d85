import { z } from "zod";
import type { FeeBasisKind, SizeRating } from "@/lib/fees";
import { FeeScheduleInput, type FeeLineInput } from "@/lib/schemas/fee-schedule";

// react-hook-form keeps an object, not a bare list, so the schedule sits under `lines`; the
// server action nests it the same way, so its field errors (`lines.0.basis.tiers.1.upToKw`)
// land on the same fields as the client-side check's.
export const FeeScheduleForm = z.object({ lines: FeeScheduleInput });
export type FeeScheduleFormInput = z.input<typeof FeeScheduleForm>;
export type FeeScheduleFormValues = z.output<typeof FeeScheduleForm>;
export type FeeBasisInput = FeeLineInput["basis"];

/** The admin's own calendar day, as the browser knows it (en-CA prints YYYY-MM-DD); the preview's date can be changed. */
export const todayIso = () => new Date().toLocaleDateString("en-CA");

/** A fresh id for a new line; `randomUUID` needs a secure context, so a plain-http intranet still gets one. */
export function newLineId(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, "0")).join("");
}

export function newFeeLine(): FeeLineInput {
  return {
    id: newLineId(),
    name: "",
    effectiveFrom: todayIso(),
    effectiveUntil: "",
    basis: { kind: "flat", amountUsd: "" },
    minimumUsd: "",
    maximumUsd: "",
  };
}

/**
 * The blank inputs of another way of working out a fee. What still means the same keeps its
 * value: the size read (DC or AC) and the tier edges between the two tiered kinds.
 */
export function basisFor(kind: FeeBasisKind, previous: FeeBasisInput | undefined): FeeBasisInput {
  const size: SizeRating = previous && "size" in previous && previous.size === "ac" ? "ac" : "dc";
  const edges =
    previous && "tiers" in previous && Array.isArray(previous.tiers) && previous.tiers.length > 0
      ? previous.tiers.map((tier) => tier.upToKw ?? "")
      : ["", ""];
  switch (kind) {
    case "flat":
      return { kind, amountUsd: "" };
    case "per-kw":
      return { kind, size, rateUsdPerKw: "" };
    case "bracket-tiers":
      return { kind, size, tiers: edges.map((upToKw) => ({ upToKw, amountUsd: "" })) };
    case "marginal-tiers":
      return { kind, size, tiers: edges.map((upToKw) => ({ upToKw, rateUsdPerKw: "" })) };
    case "valuation-percent":
      return { kind, ratePercent: "" };
  }
}
