"use client";

import { useFieldArray, useFormContext } from "react-hook-form";
import { Button } from "@/components/ui/button";
import type { DesignFormValues } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { CheckboxInput, SelectInput, TextInput, type Issues } from "./design-fields";
import { nextLineId } from "./line-ids";

function describe(item: EquipmentDto): string {
  const name = `${item.maker} ${item.model}`;
  if (item.kind === "module") return `${name} — ${item.specs.powerW} W`;
  if (item.kind === "inverter") {
    const s = item.specs;
    const type = s.storageRole === "multimode" ? "multimode" : s.storageRole === "battery" ? "battery inverter" : s.inverterKind;
    return `${name} — ${type}, ${s.acPowerW} W AC`;
  }
  if (item.kind === "battery") return `${name} — ${item.specs.usableKwh} kWh usable`;
  return `${name} — ${item.specs.deviceKind === "optimizer" ? "optimizer" : "shutdown device"}`;
}

export function EquipmentStep({ catalog, issues }: { catalog: EquipmentDto[]; issues: Issues }) {
  const { control } = useFormContext<DesignFormValues>();
  const inverters = useFieldArray({ control, name: "equipment.inverters" });
  const of = (kind: EquipmentDto["kind"]) =>
    catalog.filter((c) => c.kind === kind).map((c) => ({ value: c.id, label: describe(c) + (c.isArchived ? " (archived)" : "") }));

  return (
    <div className="space-y-5">
      <SelectInput name="equipment.moduleId" label="PV module" options={of("module")} empty="Choose a module" issues={issues} />
      <div className="space-y-3">
        <p className="label mb-0">Inverters</p>
        {issues["equipment.inverters"] ? <p className="text-xs text-result-fail">{issues["equipment.inverters"]}</p> : null}
        {inverters.fields.map((field, i) => (
          <div key={field.id} className="grid items-end gap-3 sm:grid-cols-[1fr_8rem_auto]" data-testid="inverter-line">
            <SelectInput
              name={`equipment.inverters.${i}.equipmentId`}
              label={`Inverter line ${field.lineId}`}
              options={of("inverter")}
              empty="Choose an inverter"
              issues={issues}
            />
            <TextInput name={`equipment.inverters.${i}.quantity`} label="Quantity" inputMode="numeric" issues={issues} />
            <Button type="button" variant="quiet" disabled={inverters.fields.length === 1} onClick={() => inverters.remove(i)}>
              Remove
            </Button>
          </div>
        ))}
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            inverters.append({
              lineId: nextLineId(
                "inv",
                inverters.fields.map((f) => f.lineId),
              ),
              equipmentId: "",
              quantity: "1",
            })
          }
        >
          Add an inverter line
        </Button>
        <p className="text-xs text-ink-faint">
          Use one line per group of identical units; microinverter branch circuits are one line each.
        </p>
      </div>
      <SelectInput
        name="equipment.deviceId"
        label="Module-level device"
        options={of("device")}
        empty="None"
        issues={issues}
        hint="DC optimizer or shutdown device behind each module."
      />
      <CheckboxInput
        name="equipment.listedRapidShutdownSystem"
        label="The array is a listed PV hazard control system"
        hint="Only when the racking, modules and devices are listed together for rapid shutdown."
      />
    </div>
  );
}
