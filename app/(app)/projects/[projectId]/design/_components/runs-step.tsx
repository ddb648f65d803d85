"use client";

import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { CONDUCTOR_SIZES, sizeLabel } from "@/lib/engineering/tables/conductor-sizes";
import { RACEWAY_TYPES, TRADE_SIZES, type DesignFormValues } from "@/lib/schemas/design";
import { CheckboxInput, SelectInput, TextInput, options, type Issues } from "./design-fields";
import { nextLineId } from "./line-ids";

const SIZES = options(CONDUCTOR_SIZES, (s) => sizeLabel(s as (typeof CONDUCTOR_SIZES)[number]));

export function RunsStep({ issues }: { issues: Issues }) {
  const { control } = useFormContext<DesignFormValues>();
  const runs = useFieldArray({ control, name: "runs" });
  const strings = useWatch({ control, name: "array.strings" }) ?? [];
  const inverters = useWatch({ control, name: "equipment.inverters" }) ?? [];
  const circuits = [
    ...strings.map((s) => ({ value: `dc:${s.lineId}`, label: `DC: string ${s.lineId}${Number(s.parallelCount) > 1 ? ` (×${s.parallelCount} in parallel)` : ""}` })),
    ...(strings.length > 1 ? [{ value: "dc:all", label: "DC: all strings combined" }] : []),
    ...inverters.map((l) => ({ value: `ac:${l.lineId}`, label: `AC: output of inverter line ${l.lineId}` })),
    ...(inverters.length > 1 ? [{ value: "ac:all", label: "AC: all inverter outputs combined" }] : [{ value: "ac:all", label: "AC: inverter output" }]),
  ];

  return (
    <div className="space-y-4">
      <p className="text-xs text-ink-faint">Each segment of wire between two pieces of equipment. Length is one way.</p>
      {issues.runs ? <p className="text-xs text-result-fail">{issues.runs}</p> : null}
      {runs.fields.map((field, i) => (
        <fieldset key={field.id} className="space-y-3 rounded border border-paper-edge p-3" data-testid="conductor-run">
          <div className="grid gap-3 sm:grid-cols-3">
            <TextInput name={`runs.${i}.label`} label="Run" inputMode="text" issues={issues} />
            <SelectInput name={`runs.${i}.circuit`} label="Carries" options={circuits} empty="Choose" issues={issues} />
            <TextInput name={`runs.${i}.lengthFt`} label="Length" suffix="ft" issues={issues} />
          </div>
          <div className="grid gap-3 sm:grid-cols-4">
            <SelectInput name={`runs.${i}.material`} label="Material" options={[{ value: "Cu", label: "Copper" }, { value: "Al", label: "Aluminum" }]} issues={issues} />
            <SelectInput name={`runs.${i}.size`} label="Size" options={SIZES} issues={issues} />
            <SelectInput name={`runs.${i}.stranding`} label="Stranding" options={options(["stranded", "solid"])} issues={issues} />
            <TextInput name={`runs.${i}.insulation`} label="Insulation" inputMode="text" issues={issues} hint="e.g. PV wire, THWN-2" />
            <SelectInput name={`runs.${i}.insulationTempC`} label="Insulation rating" options={options(["75", "90"], (v) => `${v} °C`)} issues={issues} />
            <SelectInput name={`runs.${i}.terminalTempC`} label="Terminal rating" options={options(["60", "75", "90"], (v) => `${v} °C`)} issues={issues} />
            <TextInput name={`runs.${i}.currentCarryingConductors`} label="Current-carrying" inputMode="numeric" issues={issues} hint="In the same raceway" />
            <TextInput name={`runs.${i}.ambientTempC`} label="Ambient" suffix="°C" issues={issues} hint="Empty: the AHJ's high design temperature" />
          </div>
          <div className="grid items-end gap-3 sm:grid-cols-4">
            <CheckboxInput name={`runs.${i}.onRoof`} label="On the roof in sunlight" />
            <TextInput name={`runs.${i}.roofClearanceIn`} label="Height above roof" suffix="in" issues={issues} />
            <SelectInput name={`runs.${i}.racewayType`} label="Conduit" options={options(RACEWAY_TYPES, (v) => (v === "none" ? "None (cable)" : v === "PVC-40" ? "PVC Schedule 40" : v))} issues={issues} />
            <SelectInput name={`runs.${i}.tradeSize`} label="Trade size" options={options(TRADE_SIZES, (v) => `${v} in`)} empty="—" issues={issues} />
            <TextInput name={`runs.${i}.ocpdA`} label="Fuse or breaker" suffix="A" inputMode="numeric" issues={issues} hint="Empty when none" />
            <SelectInput name={`runs.${i}.egcSize`} label="Equipment grounding conductor" options={SIZES} empty="—" issues={issues} />
          </div>
          <Button type="button" variant="quiet" disabled={runs.fields.length === 1} onClick={() => runs.remove(i)}>
            Remove this run
          </Button>
        </fieldset>
      ))}
      <Button
        type="button"
        variant="secondary"
        onClick={() =>
          runs.append({
            lineId: nextLineId("run", runs.fields.map((f) => f.lineId)), label: "", circuit: "", lengthFt: "", material: "Cu", size: "10", stranding: "stranded", insulation: "THWN-2",
            wireAreaIn2: "", insulationTempC: "90", terminalTempC: "", ambientTempC: "", onRoof: false, roofClearanceIn: "", currentCarryingConductors: "", arrangement: "",
            racewayType: "EMT", tradeSize: "3/4", route: "", ocpdA: "", egcSize: "10",
          })
        }
      >
        Add a conductor run
      </Button>
    </div>
  );
}
