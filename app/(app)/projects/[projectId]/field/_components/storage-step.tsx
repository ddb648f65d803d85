import type { Path } from "react-hook-form";
import type { FormValues } from "./form-values";
import { LabelledInput, Reading, ResultLine, Step } from "./reading-parts";
import type { StepProps } from "./step-props";

const fmt = (n: number) => n.toLocaleString("en-US", { maximumFractionDigits: 2 });

/** A yes-or-no seen on site, as two large radio buttons a gloved thumb can hit. */
function YesNoField({ name, legend, reg }: { name: Path<FormValues>; legend: string; reg: StepProps["reg"] }) {
  return (
    <fieldset className="space-y-1">
      <legend className="label">{legend}</legend>
      <div className="flex gap-3">
        {(["yes", "no"] as const).map((v) => (
          <label key={v} className="flex min-h-11 items-center gap-2 rounded border border-paper-edge px-3 text-base">
            <input type="radio" value={v} {...reg(name)} />
            {v === "yes" ? "Yes" : "No"}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** A decimal reading typed on a phone. */
function NumberInput({ name, reg }: { name: Path<FormValues>; reg: StepProps["reg"] }) {
  return <input id={name} className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg(name)} />;
}

/** With batteries: the stored-energy cautions, the charge shown, the backup test and the settings read back from the inverter. */
export function StorageStep({ number, facts, errors, byId, reg }: StepProps) {
  const storage = facts.storage;
  if (!storage) return null;
  return (
    <Step
      id="storage"
      number={number}
      title="Energy storage"
      intro={
        <>
          <p>{storage.summary}.</p>
          <div
            className="mt-2 rounded border border-result-warn/50 bg-result-warn/10 p-3 text-sm text-ink"
            role="note"
            aria-label="Stored energy cautions"
            data-testid="storage-cautions"
          >
            <p className="font-semibold">Stored energy</p>
            <ul className="mt-1 list-disc space-y-1 pl-5">
              <li>
                A battery stays energized when the array and the grid are off. Opening the PV disconnect, the PV breaker or the grid supply
                leaves the battery, its circuits and the backup loads panel live.
              </li>
              <li>
                Open the energy storage system disconnect before touching battery circuits, and follow the manufacturer&apos;s instructions
                and your licensed practice for the backup test.
              </li>
            </ul>
          </div>
        </>
      }
    >
      <Reading
        title="State of charge the system shows"
        inputId="storage.stateOfChargePct"
        unit="%"
        result={byId("storage-charge")}
        error={errors["storage.stateOfChargePct"]}
        bare
      >
        <NumberInput name="storage.stateOfChargePct" reg={reg} />
      </Reading>

      {storage.hasBackupPanel ? (
        <section className="space-y-3" aria-label="Backup test">
          <p className="text-sm text-ink-soft">
            Open the grid supply (the main breaker or the utility disconnect) and watch the backup loads panel.
            {storage.transferTimeS !== null ? ` The inverter states a transfer time of ${fmt(storage.transferTimeS)} s.` : ""}
          </p>
          <YesNoField name="storage.gridOpened" legend="Grid supply opened" reg={reg} />
          <YesNoField name="storage.panelCarried" legend="Backup loads panel stayed on" reg={reg} />
          <ResultLine result={byId("storage-backup")} />
          <LabelledInput label="Seconds to transfer" htmlFor="storage.transferSeconds" unit="s" error={errors["storage.transferSeconds"]}>
            <NumberInput name="storage.transferSeconds" reg={reg} />
          </LabelledInput>
          <ResultLine result={byId("storage-transfer-time")} />
        </section>
      ) : null}

      {storage.pcsSettingA !== null ? (
        <Reading
          title="Power control current setting on the inverter"
          inputId="storage.pcsSettingA"
          unit="A"
          hint={`Designed: ${fmt(storage.pcsSettingA)} A.`}
          result={byId("storage-power-control")}
          error={errors["storage.pcsSettingA"]}
          bare
        >
          <NumberInput name="storage.pcsSettingA" reg={reg} />
        </Reading>
      ) : null}

      {storage.exportLimitKw !== null ? (
        <Reading
          title="Export limit on the inverter"
          inputId="storage.exportLimitKw"
          unit="kW"
          hint={`Designed: ${fmt(storage.exportLimitKw)} kW${storage.exportLimitKw === 0 ? " (non-export)" : ""}.`}
          result={byId("storage-export-limit")}
          error={errors["storage.exportLimitKw"]}
          bare
        >
          <NumberInput name="storage.exportLimitKw" reg={reg} />
        </Reading>
      ) : null}
    </Step>
  );
}
