"use client";

import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { CONDUCTOR_SIZES, sizeLabel } from "@/lib/engineering/tables/conductor-sizes";
import type { DesignFormValues } from "@/lib/schemas/design";
import { BATTERY_CIRCUIT_KINDS, INSULATIONS, OPERATING_MODES } from "@/lib/schemas/design-options";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { CheckboxInput, MATERIALS, SelectInput, TextInput, YES_NO, options, type Issues } from "./design-fields";
import { nextLineId } from "./line-ids";
import { LOCATION_LABELS } from "./storage-words";

const SIZES = options(CONDUCTOR_SIZES, (s) => sizeLabel(s as (typeof CONDUCTOR_SIZES)[number]));
const MODE_LABELS: Record<(typeof OPERATING_MODES)[number], string> = {
  "backup-only": "Backup only",
  "self-consumption": "Self-consumption",
  export: "Export",
  "non-export": "Non-export",
};
const CIRCUIT_LABELS: Record<(typeof BATTERY_CIRCUIT_KINDS)[number], string> = {
  "battery-dc": "Batteries to the multimode inverter (DC)",
  "battery-inverter-output": "Battery inverter output (AC)",
};

type Line = { lineId?: string };
const ids = (lines: Line[] | undefined) => (lines ?? []).map((l) => l.lineId ?? "");

/** The storage step: no battery, or batteries with their coupling, place, operating mode, backup loads panel and circuits. */
export function StorageStep({ catalog, issues }: { catalog: EquipmentDto[]; issues: Issues }) {
  const { control } = useFormContext<DesignFormValues>();
  const coupling = useWatch({ control, name: "storage.coupling" as never }) as unknown as string | undefined;
  const hasBackupPanel = useWatch({ control, name: "storage.hasBackupPanel" as never }) as unknown as boolean | undefined;
  const inverterLines = useWatch({ control, name: "equipment.inverters" }) ?? [];
  const byId = new Map(catalog.map((c) => [c.id, c]));
  const banks = useFieldArray({ control, name: "storage.banks" as never });
  const loads = useFieldArray({ control, name: "storage.backupLoads" as never });
  const circuits = useFieldArray({ control, name: "storage.circuits" as never });
  const named = (c: EquipmentDto) => `${c.maker} ${c.model}${c.isArchived ? " (archived)" : ""}`;
  const batteries = catalog.filter((c) => c.kind === "battery").map((c) => ({ value: c.id, label: named(c) }));
  const batteryInverters = catalog
    .filter((c) => c.kind === "inverter" && c.specs.storageRole === "battery")
    .map((c) => ({ value: c.id, label: named(c) }));
  const multimodeLines = inverterLines.map((l) => {
    const item = l.equipmentId ? byId.get(l.equipmentId) : undefined;
    const role = item?.kind === "inverter" && item.specs.storageRole === "multimode" ? " (multimode)" : "";
    return { value: l.lineId ?? "", label: `Line ${l.lineId}${item ? `: ${named(item)}${role}` : ""}` };
  });

  return (
    <div className="space-y-5">
      <SelectInput
        name="storage.coupling"
        label="Battery"
        options={[
          { value: "none", label: "No battery" },
          { value: "dc", label: "DC-coupled, multimode (hybrid) inverter" },
          { value: "ac", label: "AC-coupled, own battery inverter" },
        ]}
        issues={issues}
        hint="Batteries change the point of connection, add the energy storage checks (Article 706) and may feed a backup loads panel."
      />
      {coupling === "dc" || coupling === "ac" ? (
        <>
          {coupling === "dc" ? (
            <SelectInput
              name="storage.multimodeInverterLineId"
              label="Multimode inverter"
              options={multimodeLines}
              empty="Choose the inverter line"
              issues={issues}
              hint="The batteries charge and discharge through this inverter of the Equipment step."
            />
          ) : (
            <div className="grid gap-3 sm:grid-cols-[1fr_12rem]">
              <SelectInput
                name="storage.batteryInverterId"
                label="Battery inverter"
                options={batteryInverters}
                empty={batteryInverters.length ? "Choose a battery inverter" : "None in the catalog yet"}
                issues={issues}
                hint="Catalog inverters whose battery role is “battery inverter”."
              />
              <TextInput name="storage.batteryInverterBreakerA" label="Its breaker" suffix="A" issues={issues} />
            </div>
          )}

          <section className="space-y-3">
            <p className="label mb-0">Batteries</p>
            {issues["storage.banks"] ? <p className="text-xs text-result-fail">{issues["storage.banks"]}</p> : null}
            {banks.fields.map((field, i) => (
              <div key={field.id} className="grid items-end gap-3 sm:grid-cols-[1fr_6rem_1fr_auto]" data-testid="battery-line">
                <SelectInput
                  name={`storage.banks.${i}.equipmentId`}
                  label={`Battery line ${(field as Line).lineId}`}
                  options={batteries}
                  empty="Choose a battery"
                  issues={issues}
                />
                <TextInput name={`storage.banks.${i}.quantity`} label="Units" inputMode="numeric" issues={issues} />
                <SelectInput
                  name={`storage.banks.${i}.location`}
                  label="Where they stand"
                  options={Object.entries(LOCATION_LABELS).map(([value, label]) => ({ value, label }))}
                  empty="Choose"
                  issues={issues}
                />
                <Button type="button" variant="quiet" onClick={() => banks.remove(i)}>
                  Remove
                </Button>
              </div>
            ))}
            <Button
              type="button"
              variant="secondary"
              onClick={() =>
                banks.append({
                  lineId: nextLineId("bat", ids(banks.fields as Line[])),
                  equipmentId: "",
                  quantity: "1",
                  location: "",
                } as never)
              }
            >
              Add a battery line
            </Button>
          </section>

          <section className="grid gap-3 sm:grid-cols-2">
            <SelectInput
              name="storage.operatingMode"
              label="Operating mode"
              options={OPERATING_MODES.map((m) => ({ value: m, label: MODE_LABELS[m] }))}
              empty="Choose"
              issues={issues}
              hint="Backup only: discharges with the grid down. Self-consumption: to the home's loads. Non-export: nothing to the grid."
            />
            <TextInput
              name="storage.pcsCurrentSettingA"
              label="Power control setting"
              suffix="A"
              issues={issues}
              hint="The output current a listed power control system is set to (705.13); blank when none is set."
            />
            <TextInput
              name="storage.exportLimitKw"
              label="Export limit"
              suffix="kW"
              issues={issues}
              hint="Blank when the utility sets none."
            />
            <TextInput
              name="storage.importLimitKw"
              label="Import limit"
              suffix="kW"
              issues={issues}
              hint="Blank when the utility sets none."
            />
          </section>

          <section className="space-y-3 rounded border border-paper-edge p-3">
            <CheckboxInput
              name="storage.hasBackupPanel"
              label="The inverter feeds a backup loads panel"
              hint="Loads moved to a panel that keeps running while the grid is down (705.12 and 710.15 apply to it)."
            />
            {hasBackupPanel ? (
              <>
                <div className="grid gap-3 sm:grid-cols-3">
                  <TextInput name="storage.backupBusbarA" label="Busbar" suffix="A" inputMode="numeric" issues={issues} />
                  <TextInput
                    name="storage.backupMainBreakerA"
                    label="Main breaker"
                    suffix="A"
                    inputMode="numeric"
                    issues={issues}
                    hint="Blank for main lugs"
                  />
                  <TextInput
                    name="storage.backupInverterBreakerA"
                    label="Inverter breaker"
                    suffix="A"
                    inputMode="numeric"
                    issues={issues}
                  />
                  <TextInput
                    name="storage.backupOtherBreakersA"
                    label="Other breakers"
                    inputMode="text"
                    issues={issues}
                    hint="e.g. 20, 20, 30"
                  />
                  <SelectInput
                    name="storage.backupPanelVoltageV"
                    label="Panel voltage"
                    options={[
                      { value: "240", label: "120/240 V" },
                      { value: "120", label: "120 V" },
                    ]}
                    issues={issues}
                  />
                  <SelectInput
                    name="storage.backupMultiwire"
                    label="Multiwire branch circuits"
                    options={YES_NO}
                    empty="Not known"
                    issues={issues}
                  />
                </div>
                <CheckboxInput
                  name="storage.backupInverterBreakerAtOppositeEnd"
                  label="The inverter breaker sits at the far end of the bus from the main"
                />
                <p className="label mb-0">Loads moved to it</p>
                {loads.fields.map((field, i) => (
                  <div key={field.id} className="grid items-end gap-3 sm:grid-cols-[1fr_7rem_8rem_auto]" data-testid="backup-load">
                    <TextInput name={`storage.backupLoads.${i}.name`} label="Load" inputMode="text" issues={issues} />
                    <TextInput name={`storage.backupLoads.${i}.currentA`} label="Current" suffix="A" issues={issues} />
                    <SelectInput
                      name={`storage.backupLoads.${i}.voltageV`}
                      label="Voltage"
                      options={options(["120", "240"], (v) => `${v} V`)}
                      issues={issues}
                    />
                    <Button type="button" variant="quiet" onClick={() => loads.remove(i)}>
                      Remove
                    </Button>
                  </div>
                ))}
                <Button
                  type="button"
                  variant="secondary"
                  onClick={() =>
                    loads.append({
                      lineId: nextLineId("load", ids(loads.fields as Line[])),
                      name: "",
                      currentA: "",
                      voltageV: "120",
                    } as never)
                  }
                >
                  Add a load
                </Button>
              </>
            ) : null}
          </section>

          <section className="grid gap-3 sm:grid-cols-3">
            <SelectInput
              name="storage.disconnectKind"
              label="Storage disconnect"
              options={[
                { value: "integral", label: "Built into the listed equipment" },
                { value: "separate", label: "A separate switch" },
              ]}
              empty="Not entered"
              issues={issues}
            />
            <SelectInput
              name="storage.disconnectWithinSight"
              label="Within sight of the batteries"
              options={YES_NO}
              empty="Not known"
              issues={issues}
            />
            <SelectInput name="storage.disconnectLockable" label="Lockable open" options={YES_NO} empty="Not known" issues={issues} />
            <TextInput
              name="storage.disconnectLocation"
              label="Disconnect location"
              inputMode="text"
              issues={issues}
              className="sm:col-span-2"
            />
            <TextInput
              name="storage.availableFaultCurrentA"
              label="Available fault current"
              suffix="A"
              issues={issues}
              hint="From the maker; printed on the disconnect's label"
            />
          </section>

          <section className="space-y-3">
            <p className="label mb-0">Battery circuits</p>
            <p className="text-xs text-ink-faint">
              Conductors and overcurrent devices are checked at 125 % of the maximum continuous current.
            </p>
            {circuits.fields.map((field, i) => (
              <fieldset
                key={field.id}
                className="grid gap-3 rounded border border-paper-edge p-3 sm:grid-cols-4"
                data-testid="battery-circuit"
              >
                <TextInput
                  name={`storage.circuits.${i}.label`}
                  label="Circuit"
                  inputMode="text"
                  issues={issues}
                  className="sm:col-span-2"
                />
                <SelectInput
                  name={`storage.circuits.${i}.kind`}
                  label="Carries"
                  options={BATTERY_CIRCUIT_KINDS.map((k) => ({ value: k, label: CIRCUIT_LABELS[k] }))}
                  issues={issues}
                  className="sm:col-span-2"
                />
                <SelectInput name={`storage.circuits.${i}.material`} label="Material" options={MATERIALS} issues={issues} />
                <SelectInput name={`storage.circuits.${i}.size`} label="Size" options={SIZES} issues={issues} />
                <SelectInput
                  name={`storage.circuits.${i}.insulation`}
                  label="Insulation"
                  options={options(INSULATIONS)}
                  empty="Not given"
                  issues={issues}
                />
                <SelectInput
                  name={`storage.circuits.${i}.insulationTempC`}
                  label="Insulation rating"
                  options={options(["75", "90"], (v) => `${v} °C`)}
                  issues={issues}
                />
                <SelectInput
                  name={`storage.circuits.${i}.terminalTempC`}
                  label="Terminals"
                  options={options(["60", "75", "90"], (v) => `${v} °C`)}
                  empty="75 °C (usual)"
                  issues={issues}
                />
                <TextInput name={`storage.circuits.${i}.ocpdA`} label="Overcurrent device" suffix="A" inputMode="numeric" issues={issues} />
                <div className="flex items-end">
                  <Button type="button" variant="quiet" onClick={() => circuits.remove(i)}>
                    Remove
                  </Button>
                </div>
              </fieldset>
            ))}
            <Button
              type="button"
              variant="secondary"
              onClick={() =>
                circuits.append({
                  lineId: nextLineId("bc", ids(circuits.fields as Line[])),
                  label: coupling === "dc" ? "Batteries to inverter" : "Battery inverter to panel",
                  kind: coupling === "dc" ? "battery-dc" : "battery-inverter-output",
                  material: "Cu",
                  size: "6",
                  insulation: "THWN-2",
                  insulationTempC: "90",
                  terminalTempC: "",
                  ocpdA: "",
                } as never)
              }
            >
              Add a battery circuit
            </Button>
          </section>

          <p className="rounded border border-paper-edge bg-paper-deep/60 p-3 text-xs text-ink-soft" data-testid="storage-caution">
            A battery stays energized when the array and the grid are off, and its terminals can deliver large fault currents. Follow the
            manufacturer&apos;s installation instructions, the residential code the AHJ has adopted and licensed practice; these checks do
            not replace them.
          </p>
        </>
      ) : null}
    </div>
  );
}
