import type { PacketInput } from "./input";

type Snapshot = Pick<PacketInput, "designInput" | "review" | "equipment">;

/** Catalog ids read as "Maker Model" in a change list. */
function equipmentNames(...snapshots: Snapshot[]): Map<string, string> {
  const names = new Map<string, string>();
  for (const { equipment } of snapshots) {
    for (const item of [equipment.module, equipment.device, ...equipment.inverters.map((l) => l.item)])
      if (item) names.set(item.id, `${item.maker} ${item.model}`);
  }
  return names;
}

// Plain names for the design fields a reviewer cares about; others show their path.
const FIELD_NAMES: Record<string, string> = {
  "service.busbarA": "Busbar rating (A)",
  "service.mainBreakerA": "Main breaker (A)",
  "service.pvBreakerA": "PV breaker (A)",
  "service.connection": "Point of connection",
  "service.voltageV": "Service voltage (V)",
  "service.pvBreakerAtOppositeEnd": "PV breaker at the far end of the bus",
  "equipment.moduleId": "PV module",
  "equipment.deviceId": "Module-level device",
  "array.mount": "Mounting",
};

/** Leaf values by dotted path, with list items keyed by their line id so reordering is not a change. */
function flatten(value: unknown, path: string, out: Map<string, string>) {
  if (Array.isArray(value)) {
    value.forEach((item, i) => {
      const id = item && typeof item === "object" && "lineId" in item ? String((item as { lineId: string }).lineId) : String(i);
      flatten(item, `${path}[${id}]`, out);
    });
  } else if (value && typeof value === "object") {
    for (const [key, v] of Object.entries(value)) if (key !== "lineId") flatten(v, path ? `${path}.${key}` : key, out);
  } else if (value !== undefined && value !== null && value !== "") {
    out.set(path, String(value));
  }
}

const nameOf = (path: string) => FIELD_NAMES[path] ?? path.replace(/\[([^\]]+)\]/g, " $1").replace(/\./g, " › ");

/** What differs between two revisions, in lines a plan reviewer can read: design fields first, then check results. */
export function describeChanges(previous: Snapshot | null, next: Snapshot): string[] {
  if (!previous) return [];
  const lines: string[] = [];
  const before = new Map<string, string>();
  const after = new Map<string, string>();
  flatten(previous.designInput, "", before);
  flatten(next.designInput, "", after);
  const names = equipmentNames(previous, next);
  for (const map of [before, after]) for (const [k, v] of map) if (names.has(v)) map.set(k, names.get(v)!);
  for (const path of [...new Set([...before.keys(), ...after.keys()])].sort()) {
    const a = before.get(path);
    const b = after.get(path);
    if (a === b) continue;
    lines.push(
      a === undefined
        ? `${nameOf(path)}: added ${b}`
        : b === undefined
          ? `${nameOf(path)}: removed (was ${a})`
          : `${nameOf(path)}: ${a} → ${b}`,
    );
  }
  const oldChecks = new Map(previous.review.checks.map((c) => [c.id, c]));
  for (const check of next.review.checks) {
    const old = oldChecks.get(check.id);
    if (!old) lines.push(`Check “${check.title}”: new, ${check.status}`);
    else if (old.status !== check.status) lines.push(`Check “${check.title}”: ${old.status} → ${check.status}`);
    else if (old.value !== check.value && check.value !== null)
      lines.push(`Check “${check.title}”: ${old.value ?? "—"} → ${check.value} ${check.unit}`.trim());
  }
  const newIds = new Set(next.review.checks.map((c) => c.id));
  for (const old of previous.review.checks) if (!newIds.has(old.id)) lines.push(`Check “${old.title}”: no longer applies`);
  return lines;
}

/** An authority's comment the office has answered, as the change list names it. */
export type AnsweredComment = { round: number; position: number; text: string; reference: string; response: string };

const clip = (text: string, max: number) => (text.length > max ? `${text.slice(0, max - 1).trimEnd()}…` : text);

/**
 * The comments a new revision answers, one line each, round and comment number first so the plan
 * reviewer can tick them off against their letter; the design changes follow them.
 */
export function describeAnswers(answered: AnsweredComment[]): string[] {
  return [...answered]
    .sort((a, b) => a.round - b.round || a.position - b.position)
    .map(
      (c) =>
        `Answers round ${c.round}, comment ${c.position + 1}${c.reference ? ` (${c.reference})` : ""}: ${clip(c.text, 120)} — ${clip(c.response, 160)}`,
    );
}
