import { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { engineToDocument, type DocumentFromEngine } from "./engine-to-document";
import { toEngineInput, type SiteConditions } from "./to-engine";

/**
 * A design as the editor saved it → the public design document, through the same
 * conversion the editor's review uses. Problems carry the editor's field paths.
 */
export function draftToDocument(draft: unknown, catalog: EquipmentDto[], conditions: SiteConditions | null): DocumentFromEngine {
  if (!conditions)
    return {
      ok: false,
      problems: [
        { path: "project.jurisdiction", message: "Choose the project's AHJ so the design has an NEC edition and design temperatures" },
      ],
    };
  const parsed = DesignInput.safeParse(draft);
  if (!parsed.success) return { ok: false, problems: parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message })) };
  const input = toEngineInput(parsed.data, catalog, conditions);
  return input.ok ? engineToDocument(input.design, input.site) : input;
}
