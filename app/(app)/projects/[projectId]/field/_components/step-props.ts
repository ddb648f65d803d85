import type { UseFormRegisterReturn, UseFormSetValue, Path } from "react-hook-form";
import type { CommissioningCheck } from "@/lib/engineering/commissioning";
import type { CommissioningFacts } from "@/lib/field/commissioning-facts";
import type { FormValues } from "./form-values";

/** What each step of the field record gets from the form. */
export type StepProps = {
  number: number;
  facts: CommissioningFacts;
  values: FormValues;
  errors: Record<string, string>;
  byId: (id: string) => CommissioningCheck | undefined;
  reg: (name: Path<FormValues>) => UseFormRegisterReturn;
  setValue: UseFormSetValue<FormValues>;
};

export const fmtV = (v: number) => v.toLocaleString("en-US", { maximumFractionDigits: 1 });
