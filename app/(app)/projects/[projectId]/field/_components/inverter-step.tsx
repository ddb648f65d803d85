import { LabelledInput, ResultLine, Step } from "./reading-parts";
import { SerialScanner } from "./serial-scanner";
import type { StepProps } from "./step-props";

/** Each inverter unit: its serial, the serial on the activation card that came with it, then activation. */
export function InverterStep({ number, facts, values, byId, reg, setValue }: StepProps) {
  return (
    <Step
      id="inverter"
      number={number}
      title="At the inverter: serial, activation card, activation"
      intro={
        <p>
          Read the serial from the unit&apos;s label and from the activation card in its box. They must match before you activate; a card
          from another box activates the wrong unit.
        </p>
      }
    >
      {facts.inverters.map((unit) => {
        const i = values.inverters.findIndex((u) => u.id === unit.id);
        if (i < 0) return null;
        const set = (field: "serial" | "cardSerial") => (serial: string) =>
          setValue(`inverters.${i}.${field}`, serial, { shouldDirty: true });
        return (
          <fieldset
            key={unit.id}
            className="space-y-3 border-t border-paper-edge pt-3 first-of-type:border-t-0 first-of-type:pt-0"
            data-testid={`inverter-${unit.id}`}
          >
            <legend className="text-sm font-semibold">
              {unit.label} <span className="font-normal text-ink-faint">· {unit.model}</span>
            </legend>
            <div className="grid gap-3 sm:grid-cols-2">
              <div className="space-y-2">
                <LabelledInput label="Serial on the unit's label" htmlFor={`inverters.${i}.serial`}>
                  <input
                    id={`inverters.${i}.serial`}
                    className="input measure text-base uppercase"
                    autoComplete="off"
                    autoCapitalize="characters"
                    spellCheck={false}
                    {...reg(`inverters.${i}.serial`)}
                  />
                </LabelledInput>
                <SerialScanner what={`${unit.label}'s label`} onSerial={set("serial")} testId={`scan-serial-${unit.id}`} />
              </div>
              <div className="space-y-2">
                <LabelledInput label="Serial on the activation card" htmlFor={`inverters.${i}.cardSerial`}>
                  <input
                    id={`inverters.${i}.cardSerial`}
                    className="input measure text-base uppercase"
                    autoComplete="off"
                    autoCapitalize="characters"
                    spellCheck={false}
                    {...reg(`inverters.${i}.cardSerial`)}
                  />
                </LabelledInput>
                <SerialScanner what={`${unit.label}'s activation card`} onSerial={set("cardSerial")} testId={`scan-card-${unit.id}`} />
              </div>
            </div>
            <ResultLine result={byId(`inverter-serial:${unit.id}`)} />
            <label className="flex items-start gap-2 text-sm">
              <input type="checkbox" className="mt-1" {...reg(`inverters.${i}.activated`)} />
              <span>Activated with this card&apos;s key, and the inverter shows it activated</span>
            </label>
            <ResultLine result={byId(`inverter-activation:${unit.id}`)} />
          </fieldset>
        );
      })}
    </Step>
  );
}
