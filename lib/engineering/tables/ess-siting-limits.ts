import type { EssSitingLimits } from "../storage-types";

// The published residential ESS limits, 2021 IRC R328 (NFPA 855-2020 chapter 15 carries the same
// figures): listed to UL 9540 (R328.2); not in sleeping rooms, closets or spaces opening into them, or
// habitable spaces (R328.4); each unit at most 20 kWh, and per location at most 40 kWh in utility
// closets, basements, storage or utility spaces and 80 kWh in garages, accessory structures and
// outdoors (R328.5). From memory, the four kinds of permitted location corroborated by a published
// bulletin on the 2021 IRC; verify the figures against the adopted text. An AHJ that adopted another
// edition or amended it passes its own. Plain data in its own module, so the AHJ form on the client
// can show these defaults without shipping the review.
export const DEFAULT_ESS_SITING: EssSitingLimits = {
  code: "IRC 2021",
  clauses: { listing: "R328.2", locations: "R328.4", ratings: "R328.5" },
  perUnitKwh: 20,
  aggregateKwh: { garage: 80, "outdoor-wall": 80, "utility-space": 40, "habitable-space": null, "sleeping-room": null },
};
