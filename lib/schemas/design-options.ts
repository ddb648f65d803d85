// The design form's fixed choices and steps, kept free of zod so the editor's
// steps can list them without shipping the schema library to the browser.

export const TRADE_SIZES = ["1/2", "3/4", "1", "1-1/4", "1-1/2", "2"] as const;
/** How a run is enclosed: no raceway (cable or free air), a conduit, or Type MC cable (metal armor). */
export const RACEWAY_TYPES = ["none", "EMT", "PVC-40", "MC"] as const;
export const SERVICE_VOLTAGES_V = ["120", "208", "240", "277", "480"] as const;
/** Conductor insulations the review knows: Table 5 holds THWN-2, XHHW-2 and RHW-2; PV wire and USE-2 need the maker's area in a raceway. */
export const INSULATIONS = ["PV wire", "USE-2", "THWN-2", "XHHW-2", "RHW-2"] as const;

export const OPERATING_MODES = ["backup-only", "self-consumption", "export", "non-export"] as const;
export const BATTERY_CIRCUIT_KINDS = ["battery-dc", "battery-inverter-output"] as const;

/** The editor's steps; each but the last edits one top-level part of the design. */
export const DESIGN_STEPS = [
  { key: "equipment", title: "Equipment" },
  { key: "array", title: "Arrays and strings" },
  { key: "service", title: "Service and connection" },
  { key: "runs", title: "Conductor runs" },
  { key: "storage", title: "Storage" },
  { key: "review", title: "Review" },
] as const;
