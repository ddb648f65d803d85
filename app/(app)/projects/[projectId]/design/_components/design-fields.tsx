"use client";

import { clsx } from "clsx";
import type { ReactNode } from "react";
import { useFormContext } from "react-hook-form";
import type { DesignFormValues } from "@/lib/schemas/design";

/** Field path → first message, from the live parse of the whole design. */
export type Issues = Record<string, string>;

type FieldProps = { name: string; label: string; issues: Issues; hint?: string; className?: string };

function Wrapper({ name, label, issues, hint, className, children }: FieldProps & { children: ReactNode }) {
  const issue = issues[name];
  return (
    <div className={className}>
      <label htmlFor={name} className="label">
        {label}
      </label>
      {children}
      {issue ? (
        <p className="mt-1 text-xs text-result-fail" role="alert">
          {issue}
        </p>
      ) : hint ? (
        <p className="mt-1 text-xs text-ink-faint">{hint}</p>
      ) : null}
    </div>
  );
}

export function TextInput(props: FieldProps & { inputMode?: "numeric" | "decimal" | "text"; suffix?: string }) {
  const { register } = useFormContext<DesignFormValues>();
  return (
    <Wrapper {...props}>
      <div className="flex items-center gap-2">
        <input
          id={props.name}
          className={clsx("input measure", props.issues[props.name] && "border-result-fail")}
          inputMode={props.inputMode ?? "decimal"}
          aria-invalid={Boolean(props.issues[props.name])}
          {...register(props.name as never)}
        />
        {props.suffix ? <span className="text-sm text-ink-faint">{props.suffix}</span> : null}
      </div>
    </Wrapper>
  );
}

export function SelectInput(props: FieldProps & { options: { value: string; label: string }[]; empty?: string }) {
  const { register } = useFormContext<DesignFormValues>();
  return (
    <Wrapper {...props}>
      <select
        id={props.name}
        className={clsx("input", props.issues[props.name] && "border-result-fail")}
        aria-invalid={Boolean(props.issues[props.name])}
        {...register(props.name as never)}
      >
        {props.empty !== undefined ? <option value="">{props.empty}</option> : null}
        {props.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </Wrapper>
  );
}

export function CheckboxInput({ name, label, hint }: { name: string; label: string; hint?: string }) {
  const { register } = useFormContext<DesignFormValues>();
  return (
    <label className="flex items-start gap-2 text-sm" htmlFor={name}>
      <input id={name} type="checkbox" className="mt-1 accent-copper" {...register(name as never)} />
      <span>
        {label}
        {hint ? <span className="block text-xs text-ink-faint">{hint}</span> : null}
      </span>
    </label>
  );
}

export const options = (values: readonly string[], label: (v: string) => string = (v) => v) =>
  values.map((value) => ({ value, label: label(value) }));

/** Conductor materials and yes-or-no answers, as every step offers them. */
export const MATERIALS = [
  { value: "Cu", label: "Copper" },
  { value: "Al", label: "Aluminum" },
];
export const YES_NO = [
  { value: "yes", label: "Yes" },
  { value: "no", label: "No" },
];
