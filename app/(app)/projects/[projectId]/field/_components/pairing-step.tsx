import { LabelledInput, Reading, ResultLine, Step } from "./reading-parts";
import type { StepProps } from "./step-props";

/** Module-level devices the inverter (or gateway) has found, against those installed; per string where the inverter shows it. */
export function PairingStep({ number, facts, values, errors, byId, reg }: StepProps) {
  const p = facts.pairing;
  if (!p) return null;
  return (
    <Step
      id="pairing"
      number={number}
      title={`Module-level ${p.word} found`}
      intro={
        <p>
          Start the device scan on the inverter or its app. Devices report one by one over several minutes: fewer than installed means wait
          or scan again.
        </p>
      }
    >
      <Reading
        title={`${p.word[0].toUpperCase()}${p.word.slice(1)} found`}
        inputId="devicesFound"
        unit={`of ${p.installed}`}
        hint={`${p.installed} installed.`}
        result={byId("device-pairing")}
        error={errors.devicesFound}
        bare
      >
        <input
          id="devicesFound"
          data-installed={p.installed}
          className="input measure text-base"
          inputMode="numeric"
          autoComplete="off"
          {...reg("devicesFound")}
        />
      </Reading>
      {p.strings.length ? (
        <div className="space-y-3 border-t border-paper-edge pt-3">
          <p className="text-xs text-ink-soft">Per string, where the inverter shows it (leave blank where it does not):</p>
          <div className="grid gap-3 sm:grid-cols-2">
            {p.strings.map((s) => {
              const i = values.strings.findIndex((v) => v.id === s.id);
              if (i < 0) return null;
              return (
                <div key={s.id} className="space-y-2">
                  <LabelledInput
                    label={`String ${s.id}`}
                    htmlFor={`strings.${i}.devicesFound`}
                    unit={`of ${s.installed}`}
                    error={errors[`strings.${i}.devicesFound`]}
                  >
                    <input
                      id={`strings.${i}.devicesFound`}
                      className="input measure text-base"
                      inputMode="numeric"
                      autoComplete="off"
                      {...reg(`strings.${i}.devicesFound`)}
                    />
                  </LabelledInput>
                  <ResultLine result={byId(`device-pairing:${s.id}`)} />
                </div>
              );
            })}
          </div>
        </div>
      ) : null}
    </Step>
  );
}
