"use client";

import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import type { DesignFormValues } from "@/lib/schemas/design";
import { SelectInput, TextInput, type Issues } from "./design-fields";
import { nextLineId } from "./line-ids";

export function ArrayStep({ issues }: { issues: Issues }) {
  const { control } = useFormContext<DesignFormValues>();
  const planes = useFieldArray({ control, name: "array.roofPlanes" });
  const strings = useFieldArray({ control, name: "array.strings" });
  const inverterLines = useWatch({ control, name: "equipment.inverters" }) ?? [];
  // The line id alone: "Inverter line inv-1" does not fit the narrow column.
  const inverterOptions = inverterLines.map((l) => ({ value: l.lineId, label: l.lineId }));

  return (
    <div className="space-y-6">
      <SelectInput
        name="array.mount"
        label="Mounting"
        options={[
          { value: "roof", label: "Roof mount" },
          { value: "ground", label: "Ground mount" },
        ]}
        issues={issues}
      />
      <section className="space-y-3">
        <h3 className="font-semibold">Roof planes</h3>
        {issues["array.roofPlanes"] ? <p className="text-xs text-result-fail">{issues["array.roofPlanes"]}</p> : null}
        {planes.fields.map((field, i) => (
          <div key={field.id} className="grid gap-3 rounded border border-paper-edge p-3 sm:grid-cols-3" data-testid="roof-plane">
            <TextInput name={`array.roofPlanes.${i}.label`} label="Name" inputMode="text" issues={issues} />
            <TextInput name={`array.roofPlanes.${i}.tiltDeg`} label="Tilt" suffix="°" issues={issues} />
            <TextInput name={`array.roofPlanes.${i}.azimuthDeg`} label="Azimuth" suffix="°" issues={issues} hint="180 = due south" />
            <TextInput name={`array.roofPlanes.${i}.moduleCount`} label="Modules" inputMode="numeric" issues={issues} />
            <TextInput name={`array.roofPlanes.${i}.attachmentCount`} label="Attachments" inputMode="numeric" issues={issues} />
            <TextInput
              name={`array.roofPlanes.${i}.rackingWeightLb`}
              label="Racking weight"
              suffix="lb"
              issues={issues}
              hint="Rails, mounts and clamps on this plane"
            />
            <div className="sm:col-span-3">
              <Button type="button" variant="quiet" disabled={planes.fields.length === 1} onClick={() => planes.remove(i)}>
                Remove this plane
              </Button>
            </div>
          </div>
        ))}
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            planes.append({
              lineId: nextLineId(
                "plane",
                planes.fields.map((f) => f.lineId),
              ),
              label: "",
              tiltDeg: "",
              azimuthDeg: "",
              moduleCount: "",
              attachmentCount: "",
              rackingWeightLb: "",
            })
          }
        >
          Add a roof plane
        </Button>
      </section>
      <section className="space-y-3">
        <h3 className="font-semibold">Strings</h3>
        <p className="text-xs text-ink-faint">
          Each line is one string design wired to one inverter input; “in parallel” repeats it. Microinverter systems have no strings.
        </p>
        {strings.fields.map((field, i) => (
          <div
            key={field.id}
            className="grid items-end gap-3 rounded border border-paper-edge p-3 sm:grid-cols-[5rem_1fr_6rem_8rem_8rem_auto]"
            data-testid="string-line"
          >
            <p className="measure pb-2 font-medium">{field.lineId}</p>
            <SelectInput
              name={`array.strings.${i}.inverterLineId`}
              label="Feeds"
              options={inverterOptions}
              empty="Choose"
              issues={issues}
            />
            <TextInput name={`array.strings.${i}.mpptIndex`} label="MPPT" inputMode="numeric" issues={issues} />
            <TextInput name={`array.strings.${i}.modulesInSeries`} label="In series" inputMode="numeric" issues={issues} />
            <TextInput name={`array.strings.${i}.parallelCount`} label="In parallel" inputMode="numeric" issues={issues} />
            <Button type="button" variant="quiet" onClick={() => strings.remove(i)}>
              Remove
            </Button>
          </div>
        ))}
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            strings.append({
              lineId: nextLineId(
                "S",
                strings.fields.map((f) => f.lineId),
              ),
              inverterLineId: inverterLines[0]?.lineId ?? "",
              mpptIndex: "1",
              modulesInSeries: "",
              parallelCount: "1",
            })
          }
        >
          Add a string
        </Button>
      </section>
      <TextInput
        name="site.peakSunHours"
        label="Peak sun hours (for the production estimate)"
        suffix="h/day"
        issues={issues}
        hint="Optional; from a solar resource map for the site."
      />
    </div>
  );
}
