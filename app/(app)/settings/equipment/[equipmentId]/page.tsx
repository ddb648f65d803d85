import type { Metadata } from "next";
import Link from "next/link";
import { FormMessage } from "@/components/ui/form-message";
import { EQUIPMENT_KIND_LABELS } from "@/lib/schemas/equipment";
import { requirePermission } from "@/lib/server/auth";
import { orNotFoundPage } from "@/lib/server/pages";
import { getEquipmentById } from "@/lib/server/data/equipment";
import { DatasheetUpload } from "../_components/datasheet-upload";
import { EquipmentForm } from "../_components/equipment-form";
import { formValuesOf } from "../_components/spec-fields";
import { updateEquipmentAction } from "../actions";

export const metadata: Metadata = { title: "Edit equipment" };

type Props = { params: Promise<{ equipmentId: string }>; searchParams: Promise<{ added?: string }> };

export default async function EditEquipmentPage({ params, searchParams }: Props) {
  const viewer = await requirePermission("catalog:edit");
  const item = await orNotFoundPage(getEquipmentById({ viewer, equipmentId: (await params).equipmentId }));
  const justAdded = (await searchParams).added === "1";
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <p className="text-sm">
        <Link href="/settings/equipment">Back to the equipment catalog</Link>
      </p>
      <h1>
        {item.maker} {item.model}{" "}
        <span className="text-base font-normal text-ink-faint">
          {EQUIPMENT_KIND_LABELS[item.kind]}
          {item.isArchived ? ", archived" : ""}
        </span>
      </h1>
      {justAdded ? <FormMessage kind="info">Added to the catalog. Attach the data sheet below.</FormMessage> : null}
      <section className="panel" aria-labelledby="datasheet-heading">
        <h2 id="datasheet-heading" className="mb-2">
          Data sheet
        </h2>
        <DatasheetUpload equipmentId={item.id} current={item.datasheet} />
      </section>
      <EquipmentForm
        save={{ update: updateEquipmentAction, equipmentId: item.id }}
        kind={item.kind}
        initial={formValuesOf(item.kind, item)}
      />
    </div>
  );
}
