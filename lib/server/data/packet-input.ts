import "server-only";
import { DEFAULT_TIME_ZONE } from "@/lib/domain/time-zones";
import { Jurisdiction, Organization, Utility } from "@/models";
import { toEngineInput } from "@/lib/design/to-engine";
import { runDesignReview } from "@/lib/design/run-review";
import type { Viewer } from "@/lib/domain/permissions";
import type { NecEdition } from "@/lib/engineering";
import { AppError } from "@/lib/errors";
import type { PacketKind } from "@/lib/domain/stored-values";
import type { PacketInput } from "@/lib/documents/packets/input";
import { DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { getDesignWithContext } from "./designs";
import { getDatasheetLocation } from "./equipment";

type Pick3<K extends EquipmentDto["kind"]> = Extract<EquipmentDto, { kind: K }>;

/**
 * Gathers everything a packet prints from the project's saved design and a
 * fresh review of it. Throws CONFLICT when the design cannot be reviewed yet.
 */
export async function buildPacketInput({ viewer, projectId, kind }: { viewer: Viewer; projectId: string; kind: PacketKind }): Promise<Omit<PacketInput, "revision" | "changes" | "override">> {
  const { project, design, catalog, conditions } = await getDesignWithContext({ viewer, projectId });
  const outcome = runDesignReview(design.draft, catalog, conditions);
  if (outcome.status !== "reviewed" || !conditions) {
    const first = outcome.status === "incomplete" ? outcome.problems[0]?.message : undefined;
    throw new AppError("CONFLICT", `The design is not complete enough to print${first ? `: ${first}` : "."}`);
  }
  const designInput = DesignInput.parse(design.draft);
  const engine = toEngineInput(designInput, catalog, conditions);
  if (!engine.ok) throw new AppError("CONFLICT", "The design refers to equipment that is no longer in the catalog.");

  const [organization, jurisdiction, utility] = await Promise.all([
    Organization.findByPk(viewer.organizationId),
    Jurisdiction.findOne({ where: { id: project.jurisdiction!.id, organizationId: viewer.organizationId } }),
    project.utility ? Utility.findOne({ where: { id: project.utility.id, organizationId: viewer.organizationId } }) : null,
  ]);
  const byId = new Map(catalog.map((c) => [c.id, c]));
  const item = <K extends EquipmentDto["kind"]>(id: string | null) => (id ? (byId.get(id) as Pick3<K> | undefined) ?? null : null);
  const equipment = {
    module: item<"module">(designInput.equipment.moduleId)!,
    inverters: designInput.equipment.inverters.map((line) => ({ lineId: line.lineId, quantity: line.quantity, item: item<"inverter">(line.equipmentId)! })),
    device: item<"device">(designInput.equipment.deviceId),
  };
  // Each data sheet once, in the order of the equipment schedule.
  const withSheets = [...new Map([equipment.module, ...equipment.inverters.map((l) => l.item), equipment.device].filter((e): e is EquipmentDto => Boolean(e?.datasheet)).map((e) => [e.id, e])).values()];
  const datasheets = [];
  if (kind === "permit") {
    for (const e of withSheets) {
      const location = await getDatasheetLocation({ viewer, equipmentId: e.id });
      datasheets.push({ title: `${e.maker} ${e.model}`, fileName: location.fileName, objectKey: location.key });
    }
  }

  return {
    kind,
    generatedAt: new Date().toISOString(),
    preparedBy: { name: viewer.name, organizationName: organization?.name ?? "", licenseNumber: organization?.licenseNumber ?? null, phone: organization?.phone ?? null, timeZone: organization?.timeZone ?? DEFAULT_TIME_ZONE },
    project: {
      number: project.number, customerName: project.customerName, customerEmail: project.customerEmail, customerPhone: project.customerPhone, street: project.street,
      city: project.city, state: project.state, postalCode: project.postalCode, utilityAccountNumber: project.utilityAccountNumber, meterNumber: project.meterNumber,
    },
    jurisdiction: { name: jurisdiction!.name, state: jurisdiction!.state, necEdition: jurisdiction!.necEdition as NecEdition, recordLowTempC: jurisdiction!.recordLowTempC, highDesignTempC: jurisdiction!.highDesignTempC },
    utility: utility ? { name: utility.name, acceptedGridProfiles: utility.acceptedGridProfiles } : null,
    designInput,
    design: engine.design,
    site: engine.site,
    equipment,
    review: outcome.review,
    datasheets,
  };
}
