import { DEFAULT_ESS_SITING } from "@/lib/engineering/tables/ess-siting-limits";
import type { EssSitingLimits } from "@/lib/engineering/storage-types";

/** An AHJ's adopted residential ESS figures as it stores them; null keeps the published figure. */
export type AdoptedEssSiting = {
  essCode: string | null;
  essPerUnitKwh: number | null;
  essGarageKwh: number | null;
  essOutdoorKwh: number | null;
  essUtilitySpaceKwh: number | null;
};

/**
 * The limits the review holds a design to in this AHJ: the published ones (DEFAULT_ESS_SITING) with the
 * AHJ's own code name and figures put in where it entered them; undefined when it entered none.
 */
export function essSitingOf(adopted: AdoptedEssSiting): EssSitingLimits | undefined {
  const { essCode, essPerUnitKwh, essGarageKwh, essOutdoorKwh, essUtilitySpaceKwh } = adopted;
  if (essCode === null && essPerUnitKwh === null && essGarageKwh === null && essOutdoorKwh === null && essUtilitySpaceKwh === null)
    return undefined;
  const d = DEFAULT_ESS_SITING;
  return {
    code: essCode ?? d.code,
    clauses: d.clauses,
    perUnitKwh: essPerUnitKwh ?? d.perUnitKwh,
    aggregateKwh: {
      ...d.aggregateKwh,
      ...(essGarageKwh === null ? {} : { garage: essGarageKwh }),
      ...(essOutdoorKwh === null ? {} : { "outdoor-wall": essOutdoorKwh }),
      ...(essUtilitySpaceKwh === null ? {} : { "utility-space": essUtilitySpaceKwh }),
    },
  };
}
