// The words the diagram (and its notes) use for a design's storage: where the batteries stand, how
// they run, what the point of connection counts. Kept apart from the drawing so the notes share them.
import {
  countedSourceCurrent,
  powerControlSettingA,
  unlessInputError,
  type EssLocation,
  type NecEdition,
  type OperatingMode,
  type StoredDesign,
} from "@/lib/engineering";

export const LOCATION_WORDS: Record<EssLocation, string> = {
  garage: "garage",
  "outdoor-wall": "outdoor wall",
  "utility-space": "utility closet or basement",
  "habitable-space": "habitable space",
  "sleeping-room": "sleeping room",
  other: "other location",
};

export const MODE_WORDS: Record<OperatingMode, string> = {
  "backup-only": "backup only",
  "self-consumption": "self-consumption",
  export: "export",
  "non-export": "non-export",
};

const num = (n: number) => String(Math.round(n * 100) / 100);

/** The lines of the point-of-connection note: what 705.12 counts there, the operating mode, the limits. */
export function pointOfConnectionLines(design: StoredDesign, edition: NecEdition | undefined): string[] {
  const s = design.storage;
  const lines: string[] = [];
  const setting = s.pcs?.listed ? s.pcs.currentSettingA : undefined;
  if (setting !== undefined) {
    const counted = edition === undefined ? null : powerControlSettingA(design, edition);
    lines.push(`Power control system set to ${num(setting)} A`);
    if (edition === undefined) lines.push("counted in place of the outputs (705.13)");
    else if (counted !== null) lines.push(`counted at the busbar (705.13, NEC ${edition})`);
    else lines.push(`not counted: NEC ${edition} has no 705.13`);
  } else if (s.pcs && !s.pcs.listed) {
    lines.push("Power control system not listed:", "every output counted");
  }
  const counted = unlessInputError(() => countedSourceCurrent(design, edition ?? 2023));
  if (counted && counted.by === "inverter-outputs") lines.push(`Sources counted: ${num(counted.currentA)} A of inverter output`);
  lines.push(`Operating mode: ${MODE_WORDS[s.operatingMode]}`);
  const by = setting !== undefined ? " by the PCS" : "";
  if (s.exportLimitKw !== undefined) lines.push(`Export limited to ${num(s.exportLimitKw)} kW${by}`);
  if (s.importLimitKw !== undefined) lines.push(`Import limited to ${num(s.importLimitKw)} kW${by}`);
  return lines;
}
