import { Equipment } from "@/models";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { putObject } from "@/lib/server/services/storage";
import { demoDatasheetPdf } from "./demo-datasheets";

/** Stores a demo data sheet for every catalog item of a freshly seeded database. */
export async function attachDemoDatasheets() {
  for (const item of await Equipment.findAll({ where: { datasheetKey: null } })) {
    const bytes = await demoDatasheetPdf(item as unknown as EquipmentDto);
    const key = `orgs/${item.organizationId}/datasheets/${item.id}/demo.pdf`;
    await putObject({ key, body: bytes, contentType: "application/pdf" });
    const fileName = `${item.maker}-${item.model}`.toLowerCase().replace(/[^a-z0-9]+/g, "-") + ".pdf";
    await item.update({
      datasheetKey: key,
      datasheetFileName: fileName,
      datasheetSizeBytes: bytes.byteLength,
      datasheetUploadedAt: new Date(),
    });
  }
}
