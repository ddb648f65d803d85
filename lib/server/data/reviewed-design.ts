import "server-only";
import { Jurisdiction, Utility } from "@/models";
import { runDesignReview } from "@/lib/design/run-review";
import type { Viewer } from "@/lib/domain/permissions";
import { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import type { ProjectDto } from "@/lib/dto/projects";
import type { DesignSnapshot, ReviewedDesign } from "@/lib/dto/reviewed-design";
import { db } from "../db";
import { referencedIds, savedOrNewDesign, siteConditionsOf } from "./designs";
import { getEquipmentByIds } from "./equipment";
import { getProjectById } from "./projects";

type Item<K extends EquipmentDto["kind"]> = Extract<EquipmentDto, { kind: K }>;

/**
 * The project's saved design (or the new draft), reviewed once: one read of the project (pass it when the
 * caller has it already), of the design, of the catalog items it names, of its AHJ and of its utility.
 */
export async function getReviewedDesign({
  viewer,
  projectId,
  project: known,
}: {
  viewer: Viewer;
  projectId: string;
  project?: ProjectDto;
}): Promise<DesignSnapshot> {
  db();
  const project = known ?? (await getProjectById({ viewer, projectId }));
  const design = await savedOrNewDesign(viewer, project);
  const [catalog, jurisdiction, utility] = await Promise.all([
    getEquipmentByIds({ viewer, ids: referencedIds(design.draft) }),
    project.jurisdiction ? Jurisdiction.findOne({ where: { id: project.jurisdiction.id, organizationId: viewer.organizationId } }) : null,
    project.utility ? Utility.findOne({ where: { id: project.utility.id, organizationId: viewer.organizationId } }) : null,
  ]);
  const conditions = jurisdiction ? siteConditionsOf(jurisdiction) : null;
  const outcome = runDesignReview(design.draft, catalog, conditions);
  if (outcome.status !== "reviewed" || !jurisdiction)
    return { status: "incomplete", project, problems: outcome.status === "incomplete" ? outcome.problems : [] };

  const designInput = DesignInput.parse(design.draft);
  const byId = new Map(catalog.map((c) => [c.id, c]));
  const item = <K extends EquipmentDto["kind"]>(id: string | null) => (id ? ((byId.get(id) as Item<K> | undefined) ?? null) : null);
  const reviewed: ReviewedDesign = {
    project,
    jurisdiction: { id: jurisdiction.id, name: jurisdiction.name, state: jurisdiction.state, ...conditions! },
    utility: utility ? { id: utility.id, name: utility.name, acceptedGridProfiles: utility.acceptedGridProfiles } : null,
    designRevision: design.revision,
    designInput,
    design: outcome.design,
    site: outcome.site,
    review: outcome.review,
    equipment: {
      module: item<"module">(designInput.equipment.moduleId)!,
      inverters: designInput.equipment.inverters.map((line) => ({
        lineId: line.lineId,
        quantity: line.quantity,
        item: item<"inverter">(line.equipmentId)!,
      })),
      device: item<"device">(designInput.equipment.deviceId),
      storage: storageItems(designInput, (id) => byId.get(id)),
    },
  };
  return { status: "reviewed", reviewed };
}

/** The catalog items of a design's storage, each once: its batteries, then an AC-coupled system's battery inverter. */
function storageItems(input: DesignInput, find: (id: string) => EquipmentDto | undefined): EquipmentDto[] {
  const storage = input.storage;
  if (!storage || storage.coupling === "none") return [];
  const ids = [...storage.banks.map((b) => b.equipmentId), ...(storage.coupling === "ac" ? [storage.batteryInverterId] : [])];
  return [...new Set(ids)].flatMap((id) => find(id) ?? []);
}
