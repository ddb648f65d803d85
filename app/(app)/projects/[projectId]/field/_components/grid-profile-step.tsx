import { LabelledInput, ResultLine, Step } from "./reading-parts";
import { OTHER_PROFILE } from "./form-values";
import type { StepProps } from "./step-props";

/** The grid profile chosen on the inverter, from the profiles the utility accepts, or typed as shown on the inverter. */
export function GridProfileStep({ number, facts, values, errors, byId, reg }: StepProps) {
  const accepted = facts.acceptedGridProfiles;
  return (
    <Step
      id="grid-profile"
      number={number}
      title="Grid profile"
      intro={
        <p>
          {accepted.length
            ? "Choose on the inverter one of the profiles the utility accepts, read it back, and record it here."
            : "The utility's accepted profiles are not on file; ask the office before you set one."}
        </p>
      }
    >
      <LabelledInput label="Profile set on the inverter" htmlFor="gridProfileChoice">
        <select id="gridProfileChoice" className="input text-base" {...reg("gridProfileChoice")}>
          <option value="">Choose…</option>
          {accepted.map((p) => (
            <option key={p} value={p}>
              {p}
            </option>
          ))}
          <option value={OTHER_PROFILE}>Other: type it as the inverter shows it</option>
        </select>
      </LabelledInput>
      {values.gridProfileChoice === OTHER_PROFILE ? (
        <LabelledInput label="Profile as the inverter shows it" htmlFor="gridProfileOther" error={errors.gridProfileOther}>
          <input id="gridProfileOther" className="input text-base" autoComplete="off" {...reg("gridProfileOther")} />
        </LabelledInput>
      ) : null}
      <ResultLine result={byId("grid-profile")} />
    </Step>
  );
}
