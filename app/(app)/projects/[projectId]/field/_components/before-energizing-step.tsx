import { insulationRequirement } from "@/lib/engineering/commissioning";
import { LabelledInput, ResultLine, Step } from "./reading-parts";
import type { StepProps } from "./step-props";

/** Each string's polarity, open-circuit voltage and insulation resistance, before anything is connected. */
export function BeforeEnergizingStep({ number, facts, values, errors, byId, reg }: StepProps) {
  const anyVoc = facts.stringTests.some((s) => s.vocApplies);
  return (
    <Step
      id="before-energizing"
      number={number}
      title="Before energizing: string tests"
      intro={
        <>
          <p>With the DC disconnect open and each string's conductors apart at the inverter, test every string before it is landed.</p>
          <p>The modules are live in daylight. Use meters and an insulation tester rated for the string voltage; the tester puts its own voltage on the conductors, so keep clear while it runs and test with the inverter and any surge protection disconnected.</p>
          {facts.stringTests.some((s) => !s.vocApplies) ? <p>Optimizers hold each module at a low voltage until the inverter runs, so those strings have no Voc test here.</p> : null}
        </>
      }
    >
      {anyVoc ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <LabelledInput label="Temperature during the Voc tests" htmlFor="vocTemperature.tempC" unit="°C" error={errors["vocTemperature.tempC"]}>
            <input id="vocTemperature.tempC" className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg("vocTemperature.tempC")} />
          </LabelledInput>
          <LabelledInput label="Read on" htmlFor="vocTemperature.source">
            <select id="vocTemperature.source" className="input text-base" {...reg("vocTemperature.source")}>
              <option value="module">The back of a module (sharper check)</option>
              <option value="ambient">The air, in the shade</option>
            </select>
          </LabelledInput>
        </div>
      ) : null}
      {facts.stringTests.map((fact) => {
        const i = values.strings.findIndex((s) => s.id === fact.id);
        if (i < 0) return null;
        const { testV, minMohm } = insulationRequirement(fact.modulesInSeries * fact.moduleVocV);
        return (
          <fieldset key={fact.id} className="space-y-3 border-t border-paper-edge pt-3" data-testid={`string-tests-${fact.id}`}>
            <legend className="text-sm font-semibold">
              String {fact.id} <span className="font-normal text-ink-faint">· {fact.modulesInSeries} modules</span>
            </legend>
            <div role="radiogroup" aria-label={`String ${fact.id} polarity`} className="flex flex-wrap gap-4 text-sm">
              <span className="text-ink-soft">Polarity at the inverter end:</span>
              {(["correct", "reversed"] as const).map((p) => (
                <label key={p} className="inline-flex items-center gap-1.5">
                  <input type="radio" value={p} {...reg(`strings.${i}.polarity`)} /> {p === "correct" ? "Correct (+ to +)" : "Reversed"}
                </label>
              ))}
            </div>
            <ResultLine result={byId(`string-polarity:${fact.id}`)} />
            <div className="grid gap-3 sm:grid-cols-2">
              {fact.vocApplies ? (
                <LabelledInput label="Open-circuit voltage" htmlFor={`strings.${i}.vocV`} unit="V" error={errors[`strings.${i}.vocV`]}>
                  <input id={`strings.${i}.vocV`} className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg(`strings.${i}.vocV`)} />
                </LabelledInput>
              ) : null}
              <LabelledInput label={`Insulation to ground, tested at ${testV} V`} htmlFor={`strings.${i}.insulationMohm`} unit="MΩ" error={errors[`strings.${i}.insulationMohm`]}>
                <input id={`strings.${i}.insulationMohm`} data-min-mohm={minMohm} className="input measure text-base" inputMode="decimal" autoComplete="off" {...reg(`strings.${i}.insulationMohm`)} />
              </LabelledInput>
            </div>
            {fact.vocApplies ? <ResultLine result={byId(`string-voc:${fact.id}`)} /> : null}
            <ResultLine result={byId(`string-insulation:${fact.id}`)} />
          </fieldset>
        );
      })}
    </Step>
  );
}
