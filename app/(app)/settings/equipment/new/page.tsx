import type { Metadata } from "next";
import { EQUIPMENT_KINDS, type EquipmentKind } from "@/lib/domain/stored-values";
import { requirePermission } from "@/lib/server/auth";
import { EquipmentForm } from "../_components/equipment-form";
import { KIND_WORDS } from "../_components/kind-words";
import { formValuesOf } from "../_components/spec-fields";
import { createEquipmentAction } from "../actions";

export const metadata: Metadata = { title: "Add equipment" };

export default async function NewEquipmentPage({ searchParams }: { searchParams: Promise<{ kind?: string }> }) {
  await requirePermission("catalog:edit");
  const asked = (await searchParams).kind;
  const kind: EquipmentKind = EQUIPMENT_KINDS.find((k) => k === asked) ?? "module";
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <h1>{KIND_WORDS[kind].add}</h1>
      <p className="text-sm text-ink-soft">
        Copy the figures from the data sheet (modules at STC); the data sheet PDF can be attached once the item is saved.
      </p>
      <EquipmentForm save={{ create: createEquipmentAction }} kind={kind} initial={formValuesOf(kind)} />
    </div>
  );
}
