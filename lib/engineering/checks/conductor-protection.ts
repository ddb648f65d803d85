import { isStandardRatingA, largestStandardRatingAtMostA, nextStandardRatingA } from "../tables/standard-ocpd-ratings";
import { smallConductorMaxOcpdA } from "../tables/small-conductor-limits";
import type { ConductorMaterial, ConductorSize, NecEdition } from "../types";

// 240.4(B): the next standard rating above a conductor's ampacity is allowed up to 800 A (REFERENCE.md, from memory).
const NEXT_SIZE_UP_LIMIT_A = 800;

/**
 * The largest OCPD that still protects a conductor: its ampacity, or the next standard
 * rating above it (240.4(B)), but never above the 240.4(D) small-conductor limit.
 */
export function maxProtectiveOcpdA(
  usableAmpacityA: number,
  size: ConductorSize,
  material: ConductorMaterial,
  edition?: NecEdition,
): number {
  if (!(usableAmpacityA > 0)) return 0;
  let allowed: number;
  if (isStandardRatingA(usableAmpacityA, { edition })) allowed = usableAmpacityA;
  else if (usableAmpacityA < NEXT_SIZE_UP_LIMIT_A) allowed = nextStandardRatingA(usableAmpacityA, { edition });
  else allowed = largestStandardRatingAtMostA(usableAmpacityA, { edition }) ?? 0;
  const smallLimit = smallConductorMaxOcpdA(size, material);
  return smallLimit === null ? allowed : Math.min(allowed, smallLimit);
}
