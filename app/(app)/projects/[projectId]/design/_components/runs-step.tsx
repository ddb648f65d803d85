"use client";

import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { CONDUCTOR_SIZES, sizeLabel } from "@/lib/engineering/tables/conductor-sizes";
import type { DesignFormValues } from "@/lib/schemas/design";
import { INSULATIONS, RACEWAY_TYPES, TRADE_SIZES } from "@/lib/schemas/design-options";
import { CheckboxInput, SelectInput, TextInput, options, type Issues } from "./design-fields";
import { nextLineId } from "./line-ids";

const SIZES = options(CONDUCTOR_SIZES, (s) => sizeLabel(s as (typeof CONDUCTOR_SIZES)[number]));
const RACEWAY_NAMES: Record<string, string> = { none: "None", EMT: "EMT", "PVC-40": "PVC Sch 40", MC: "MC cable" };

/** `countedConductors`: the current-carrying conductors the review counts for each run from its circuits, once the design reviews. */
export function RunsStep({ issues, countedConductors }: { issues: Issues; countedConductors: Record<string, number | null> }) {
  const { control } = useFormContext<DesignFormValues>();
  const runs = useFieldArray({ control, name: "runs" });
  const strings = useWatch({ control, name: "array.strings" }) ?? [];
  const inverters = useWatch({ control, name: "equipment.inverters" }) ?? [];
  const several = strings.length > 1 || strings.some((s) => Number(s.parallelCount) > 1);
  const circuits = [
    ...strings.map((s) => ({
      value: `dc:${s.lineId}`,
      label: `DC: string ${s.lineId}${Number(s.parallelCount) > 1 ? ` (×${s.parallelCount} in parallel)` : ""}`,
    })),
    ...(several ? [{ value: "dc:all", label: "DC: every string, in one raceway" }] : []),
    ...inverters.map((l) => ({ value: `ac:${l.lineId}`, label: `AC: output of inverter line ${l.lineId}` })),
    ...(inverters.length > 1
      ? [{ value: "ac:all", label: "AC: all inverter outputs" }]
      : [{ value: "ac:all", label: "AC: inverter output" }]),
  ];

  return (
    <div className="space-y-4">
      <p className="text-xs text-ink-faint">
        One entry per raceway or cable between two pieces of equipment; length is one way. Strings sharing a raceway are separate circuits,
        each on its own pair of conductors, unless they are joined in parallel before it.
      </p>
      {issues.runs ? <p className="text-xs text-result-fail">{issues.runs}</p> : null}
      {runs.fields.map((field, i) => {
        const counted = Object.hasOwn(countedConductors, field.lineId) ? (countedConductors[field.lineId] ?? null) : null;
        return (
          <fieldset key={field.id} className="space-y-3 rounded border border-paper-edge p-3" data-testid="conductor-run">
            <div className="grid gap-3 sm:grid-cols-3">
              <TextInput name={`runs.${i}.label`} label="Run" inputMode="text" issues={issues} />
              <SelectInput name={`runs.${i}.circuit`} label="Carries" options={circuits} empty="Choose" issues={issues} />
              <TextInput name={`runs.${i}.lengthFt`} label="Length" suffix="ft" issues={issues} />
            </div>
            <div className="grid gap-3 sm:grid-cols-4">
              <SelectInput
                name={`runs.${i}.arrangement`}
                label="Circuits in it"
                options={[
                  { value: "separate", label: "Each on its own conductors" },
                  { value: "combined", label: "Joined before this run" },
                ]}
                empty="As usual"
                issues={issues}
                hint="Usual: strings apart, AC outputs joined after a combiner"
              />
              <SelectInput
                name={`runs.${i}.material`}
                label="Material"
                options={[
                  { value: "Cu", label: "Copper" },
                  { value: "Al", label: "Aluminum" },
                ]}
                issues={issues}
              />
              <SelectInput name={`runs.${i}.size`} label="Size" options={SIZES} issues={issues} />
              <SelectInput name={`runs.${i}.stranding`} label="Stranding" options={options(["stranded", "solid"])} issues={issues} />
              <SelectInput name={`runs.${i}.insulation`} label="Insulation" options={options(INSULATIONS)} issues={issues} />
              <TextInput
                name={`runs.${i}.wireAreaIn2`}
                label="Wire area"
                suffix="in²"
                issues={issues}
                hint="PV wire or USE-2 in a conduit: from its data sheet"
              />
              <SelectInput
                name={`runs.${i}.insulationTempC`}
                label="Insulation rating"
                options={options(["75", "90"], (v) => `${v} °C`)}
                issues={issues}
              />
              <SelectInput
                name={`runs.${i}.terminalTempC`}
                label="Terminal rating"
                options={options(["60", "75", "90"], (v) => `${v} °C`)}
                empty="As marked"
                issues={issues}
                hint="Inverter's marking; unmarked: 60 °C up to 100 A"
              />
              <TextInput
                name={`runs.${i}.currentCarryingConductors`}
                label="Current-carrying"
                inputMode="numeric"
                issues={issues}
                hint={counted === null ? "Blank: counted from its circuits" : `Blank: ${counted}, counted from its circuits`}
              />
              <TextInput
                name={`runs.${i}.ambientTempC`}
                label="Ambient"
                suffix="°C"
                issues={issues}
                hint="Empty: the AHJ's high design temperature"
              />
              <div className="flex items-end pb-2">
                <CheckboxInput name={`runs.${i}.onRoof`} label="On the roof in sunlight" />
              </div>
              <TextInput name={`runs.${i}.roofClearanceIn`} label="Height above roof" suffix="in" issues={issues} />
            </div>
            <div className="grid items-start gap-3 sm:grid-cols-5">
              <SelectInput
                name={`runs.${i}.racewayType`}
                label="Raceway"
                options={options(RACEWAY_TYPES, (v) => RACEWAY_NAMES[v] ?? v)}
                issues={issues}
                hint="None: free air or cable"
              />
              <SelectInput
                name={`runs.${i}.tradeSize`}
                label="Trade size"
                options={options(TRADE_SIZES, (v) => `${v} in`)}
                empty="—"
                issues={issues}
              />
              <SelectInput
                name={`runs.${i}.route`}
                label="Enters the building"
                options={[
                  { value: "outdoors", label: "No" },
                  { value: "inside", label: "Yes" },
                ]}
                empty="Choose"
                issues={issues}
                hint="DC inside needs metal raceway or MC"
              />
              <TextInput
                name={`runs.${i}.ocpdA`}
                label="Fuse or breaker"
                suffix="A"
                inputMode="numeric"
                issues={issues}
                hint="Empty when none"
              />
              <SelectInput name={`runs.${i}.egcSize`} label="Grounding conductor" options={SIZES} empty="—" issues={issues} />
            </div>
            <Button type="button" variant="quiet" disabled={runs.fields.length === 1} onClick={() => runs.remove(i)}>
              Remove this run
            </Button>
          </fieldset>
        );
      })}
      <Button
        type="button"
        variant="secondary"
        onClick={() =>
          runs.append({
            lineId: nextLineId(
              "run",
              runs.fields.map((f) => f.lineId),
            ),
            label: "",
            circuit: "",
            lengthFt: "",
            material: "Cu",
            size: "10",
            stranding: "stranded",
            insulation: "THWN-2",
            wireAreaIn2: "",
            insulationTempC: "90",
            terminalTempC: "",
            ambientTempC: "",
            onRoof: false,
            roofClearanceIn: "",
            currentCarryingConductors: "",
            arrangement: "",
            racewayType: "EMT",
            tradeSize: "3/4",
            route: "",
            ocpdA: "",
            egcSize: "10",
          })
        }
      >
        Add a conductor run
      </Button>
    </div>
  );
}
