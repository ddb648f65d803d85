import "server-only";
import type { Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { PacketKind } from "@/lib/domain/stored-values";
import type { PacketInput } from "@/lib/documents/packets/input";
import type { DesignSnapshot, ReviewedDesign } from "@/lib/dto/reviewed-design";
import { getDatasheetLocation } from "./equipment";
import { getOrganization } from "./organizations";

/** The reviewed design, or CONFLICT (with the first problem) when the design cannot be reviewed yet. */
export function reviewedOrConflict(snapshot: DesignSnapshot): ReviewedDesign {
  if (snapshot.status === "reviewed") return snapshot.reviewed;
  const first = snapshot.problems[0]?.message;
  throw new AppError("CONFLICT", `The design is not complete enough to print${first ? `: ${first}` : "."}`);
}

/** Gathers everything a packet prints from the reviewed design, the organization and the data sheets' locations. */
export async function buildPacketInput({
  viewer,
  reviewed,
  kind,
}: {
  viewer: Viewer;
  reviewed: ReviewedDesign;
  kind: PacketKind;
}): Promise<Omit<PacketInput, "revision" | "changes" | "override">> {
  const { project, jurisdiction, utility, equipment } = reviewed;
  const organization = await getOrganization({ viewer });
  // Each data sheet once, in the order of the equipment schedule.
  const withSheets = [
    ...new Map(
      [equipment.module, ...equipment.inverters.map((l) => l.item), equipment.device, ...(equipment.storage ?? [])]
        .filter((e): e is NonNullable<typeof e> => Boolean(e?.datasheet))
        .map((e) => [e.id, e]),
    ).values(),
  ];
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
    preparedBy: {
      name: viewer.name,
      organizationName: organization.name,
      licenseNumber: organization.licenseNumber,
      phone: organization.phone,
      timeZone: organization.timeZone,
    },
    project: {
      number: project.number,
      customerName: project.customerName,
      customerEmail: project.customerEmail,
      customerPhone: project.customerPhone,
      street: project.street,
      city: project.city,
      state: project.state,
      postalCode: project.postalCode,
      utilityAccountNumber: project.utilityAccountNumber,
      meterNumber: project.meterNumber,
    },
    jurisdiction: {
      name: jurisdiction.name,
      state: jurisdiction.state,
      necEdition: jurisdiction.necEdition,
      recordLowTempC: jurisdiction.recordLowTempC,
      highDesignTempC: jurisdiction.highDesignTempC,
    },
    utility: utility ? { name: utility.name, acceptedGridProfiles: utility.acceptedGridProfiles } : null,
    designInput: reviewed.designInput,
    design: reviewed.design,
    site: reviewed.site,
    equipment,
    review: reviewed.review,
    datasheets,
  };
}
