import { insulationRequirement } from "@/lib/engineering/commissioning/insulation-resistance";
import { stringVocWindow } from "@/lib/engineering/commissioning/string-voc";
import { LabelledInput, ResultLine, Step } from "./reading-parts";
import { fmtV, type StepProps } from "./step-props";

/** Each string's polarity, open-circuit voltage and insulation resistance, before anything is connected. */
export function BeforeEnergizingStep({ number, facts, values, errors, byId, reg }: StepProps) {
  const anyVoc = facts.stringTests.some((s) => s.vocApplies);
  // The Voc to expect follows the temperature as it is typed; none until a plausible one is in.
  const tempC = Number(values.vocTemperature.tempC);
  const temperature =
    values.vocTemperature.tempC.trim() !== "" && Number.isFinite(tempC) && tempC >= -40 && tempC <= 90
      ? { tempC, source: values.vocTemperature.source }
      : null;
  return (
    <Step
      id="before-energizing"
      number={number}
      title="Before energizing: string tests"
      intro={
        <>
          <p>
            With the DC disconnect open and each string&apos;s conductors apart at the inverter, test every string before it is landed. Read
            the temperature on the back of a module in full sun for the sharpest Voc check.
          </p>
          <p>
            The modules are live in daylight. Use meters and an insulation tester rated for the string voltage; the tester puts its own
            voltage on the conductors, so keep clear while it runs and test with the inverter and any surge protection disconnected.
          </p>
          {facts.stringTests.some((s) => !s.vocApplies) ? (
            <p>Optimizers hold each module at a low voltage until the inverter runs, so those strings have no Voc test here.</p>
          ) : null}
        </>
      }
    >
      {anyVoc ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <LabelledInput
            label="Temperature during the Voc tests"
            htmlFor="vocTemperature.tempC"
            unit="°C"
            error={errors["vocTemperature.tempC"]}
          >
            <input
              id="vocTemperature.tempC"
              className="input measure text-base"
              inputMode="decimal"
              autoComplete="off"
              {...reg("vocTemperature.tempC")}
            />
          </LabelledInput>
          <LabelledInput label="Read on" htmlFor="vocTemperature.source">
            <select id="vocTemperature.source" className="input text-base" {...reg("vocTemperature.source")}>
              <option value="module">Back of a module</option>
              <option value="ambient">Air, in the shade</option>
            </select>
          </LabelledInput>
        </div>
      ) : null}
      {facts.stringTests.map((fact) => {
        const i = values.strings.findIndex((s) => s.id === fact.id);
        if (i < 0) return null;
        const { testV, minMohm } = insulationRequirement(fact.modulesInSeries * fact.moduleVocV);
        const voc = fact.vocApplies && temperature ? stringVocWindow(fact, temperature) : null;
        return (
          <fieldset key={fact.id} className="space-y-3 border-t border-paper-edge pt-3" data-testid={`string-tests-${fact.id}`}>
            <legend className="text-sm font-semibold">
              String {fact.id} <span className="font-normal text-ink-faint">· {fact.modulesInSeries} modules</span>
            </legend>
            <div role="radiogroup" aria-label={`String ${fact.id} polarity`} className="text-sm">
              <p className="label">Polarity at the inverter end</p>
              <div className="flex flex-wrap gap-x-6 gap-y-2">
                {(["correct", "reversed"] as const).map((p) => (
                  <label key={p} className="inline-flex items-center gap-2 py-1">
                    <input type="radio" value={p} {...reg(`strings.${i}.polarity`)} /> {p === "correct" ? "Correct (+ to +)" : "Reversed"}
                  </label>
                ))}
              </div>
            </div>
            <ResultLine result={byId(`string-polarity:${fact.id}`)} />
            <div className="grid gap-3 sm:grid-cols-2">
              {fact.vocApplies ? (
                <div>
                  <LabelledInput label="Open-circuit voltage" htmlFor={`strings.${i}.vocV`} unit="V" error={errors[`strings.${i}.vocV`]}>
                    <input
                      id={`strings.${i}.vocV`}
                      data-expected-v={voc?.expectedV}
                      className="input measure text-base"
                      inputMode="decimal"
                      autoComplete="off"
                      {...reg(`strings.${i}.vocV`)}
                    />
                  </LabelledInput>
                  <p className="mt-1 text-xs text-ink-soft">
                    {voc
                      ? `Expect ${fmtV(voc.lowV)} to ${fmtV(voc.highV)} V at this temperature.`
                      : "Enter the temperature to see the Voc to expect."}
                  </p>
                </div>
              ) : null}
              <LabelledInput
                label={`Insulation to ground, tested at ${testV} V`}
                htmlFor={`strings.${i}.insulationMohm`}
                unit="MΩ"
                error={errors[`strings.${i}.insulationMohm`]}
              >
                <input
                  id={`strings.${i}.insulationMohm`}
                  data-min-mohm={minMohm}
                  className="input measure text-base"
                  inputMode="decimal"
                  autoComplete="off"
                  {...reg(`strings.${i}.insulationMohm`)}
                />
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
