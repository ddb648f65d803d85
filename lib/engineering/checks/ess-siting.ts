import { atMost, fmt, makeCheck, plural } from "../check-result";
import { clause } from "../clauses";
import { type StoredDesign, totalUnits } from "../storage";
import { DEFAULT_ESS_SITING } from "../tables/ess-siting-limits";
import type { CheckResult, EssLocation, EssSitingLimits, Site } from "../types";

export { DEFAULT_ESS_SITING } from "../tables/ess-siting-limits";

export const LOCATION_NAMES: Readonly<Record<EssLocation, string>> = {
  garage: "a garage or accessory structure",
  "outdoor-wall": "outdoors or on an exterior wall",
  "utility-space": "a utility closet, basement or storage space",
  "habitable-space": "a habitable room",
  "sleeping-room": "a sleeping room or a closet opening into one",
  other: "another location",
};

export function essSiting(site: Site): EssSitingLimits {
  return site.essSiting ?? DEFAULT_ESS_SITING;
}

function cite(limits: EssSitingLimits, which: keyof EssSitingLimits["clauses"]): string {
  return `${limits.code} ${limits.clauses[which]}`;
}

/** Nameplate kWh standing in each location the design uses. */
export function kwhByLocation(design: StoredDesign): Map<EssLocation, number> {
  const totals = new Map<EssLocation, number>();
  for (const b of design.storage.banks) totals.set(b.location, (totals.get(b.location) ?? 0) + b.quantity * b.unit.nameplateKwh);
  return totals;
}

/**
 * The residential siting rules: each unit's listing and energy, each location allowed, and the energy
 * gathered in each location, against the limits the AHJ adopted. Outside one- and two-family dwellings the
 * fire code governs storage, which the review does not check: it says so rather than pass.
 */
export function checkEssSiting(design: StoredDesign, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const limits = essSiting(site);
  if (!site.isDwelling) {
    return [
      makeCheck({
        id: "ess-siting",
        title: "Battery location and size",
        status: "warn",
        value: null,
        limit: null,
        unit: "kWh",
        clause: cite(limits, "ratings"),
        edition,
        message:
          "The residential limits on battery size and location apply to dwellings; for this building the fire code the AHJ adopted decides.",
        fix: "Confirm the battery's location and size with the AHJ's fire code reviewer.",
      }),
    ];
  }
  const results: CheckResult[] = [];
  for (const bank of design.storage.banks) results.push(unitListing(bank, limits, edition), unitSize(bank, limits, edition));
  for (const [location, kwh] of kwhByLocation(design)) results.push(locationCheck(location, kwh, limits, edition));
  const parallel = unitsInParallel(design, edition);
  if (parallel) results.push(parallel);
  return results;
}

function unitListing(bank: StoredDesign["storage"]["banks"][number], limits: EssSitingLimits, edition: Site["necEdition"]): CheckResult {
  const listings = bank.unit.listings;
  const listed = listings?.some((l) => /^UL\s*9540$/i.test(l.trim())) ?? false;
  const name = `${bank.unit.maker} ${bank.unit.model}`;
  return makeCheck({
    id: `ess-listing:${bank.id}`,
    title: `Battery listing, ${name}`,
    status: listings === undefined ? "warn" : listed ? "pass" : "fail",
    value: null,
    limit: null,
    unit: "",
    clause: cite(limits, "listing"),
    edition,
    message:
      listings === undefined
        ? `The ${name}'s listings are not entered; a residential energy storage system must be listed to UL 9540.`
        : listed
          ? `The ${name} is listed to UL 9540.`
          : `The ${name} is not listed to UL 9540 (its listings: ${listings.length > 0 ? listings.join(", ") : "none"}).`,
    fix: listed ? undefined : "Use an energy storage system listed to UL 9540, as its data sheet states.",
    field: listings === undefined ? `storage.banks.${bank.id}.unit.listings` : undefined,
  });
}

function unitSize(bank: StoredDesign["storage"]["banks"][number], limits: EssSitingLimits, edition: Site["necEdition"]): CheckResult {
  const kwh = bank.unit.nameplateKwh;
  const ok = atMost(kwh, limits.perUnitKwh);
  return makeCheck({
    id: `ess-unit-size:${bank.id}`,
    title: `Battery unit size, ${bank.unit.maker} ${bank.unit.model}`,
    status: ok ? "pass" : "fail",
    value: kwh,
    limit: limits.perUnitKwh,
    unit: "kWh",
    clause: cite(limits, "ratings"),
    edition,
    message: `Each unit stores ${fmt(kwh)} kWh; a unit in a dwelling may store at most ${fmt(limits.perUnitKwh)} kWh${ok ? "" : " unless the fire code's rules for larger systems are met"}.`,
    fix: ok ? undefined : "Use smaller units, or design the system to the fire code's rules for larger systems with the AHJ.",
  });
}

function locationCheck(location: EssLocation, kwh: number, limits: EssSitingLimits, edition: Site["necEdition"]): CheckResult {
  const place = LOCATION_NAMES[location];
  const limit = limits.aggregateKwh[location];
  const base = { id: `ess-location:${location}`, title: `Batteries in ${place}`, unit: "kWh", edition, value: kwh };
  if (limit === undefined) {
    return makeCheck({
      ...base,
      status: "warn",
      limit: null,
      clause: cite(limits, "locations"),
      message: `The adopted code sets no limit for batteries in ${place}; the AHJ decides whether ${fmt(kwh)} kWh may stand there.`,
      fix: "Choose a location the code names, or confirm this one with the AHJ.",
      field: "storage.banks",
    });
  }
  if (limit === null) {
    return makeCheck({
      ...base,
      status: "fail",
      limit: 0,
      clause: cite(limits, "locations"),
      message: `Batteries may not be installed in ${place}.`,
      fix: "Move them to a garage, an exterior wall, or a utility closet or basement as the code allows.",
    });
  }
  const ok = atMost(kwh, limit);
  return makeCheck({
    ...base,
    status: ok ? "pass" : "fail",
    limit,
    clause: cite(limits, "ratings"),
    message: `${fmt(kwh)} kWh of batteries stand in ${place}, ${ok ? "within" : "above"} the ${fmt(limit)} kWh allowed there.`,
    fix: ok ? undefined : "Split the batteries between locations, use fewer units, or meet the fire code's rules for larger systems.",
  });
}

/** The maker's limit on units joined in parallel, where the data sheet states one (110.3(B): follow the listing). */
function unitsInParallel(design: StoredDesign, edition: Site["necEdition"]): CheckResult | null {
  const limits = design.storage.banks.map((b) => b.unit.maxUnitsInParallel).filter((n): n is number => n !== undefined);
  if (limits.length === 0) return null;
  const limit = Math.min(...limits);
  const units = totalUnits(design.storage);
  const ok = units <= limit;
  return makeCheck({
    id: "ess-units-parallel",
    title: "Battery units joined in parallel",
    status: ok ? "pass" : "fail",
    value: units,
    limit,
    unit: "units",
    clause: clause("listing", edition),
    edition,
    message: `The system joins ${plural(units, "unit")}; the maker allows at most ${limit}.`,
    fix: ok ? undefined : `Use at most ${limit} units on this system.`,
  });
}
