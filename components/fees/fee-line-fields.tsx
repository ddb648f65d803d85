"use client";

import type { HTMLAttributes } from "react";
import { get, useFieldArray, useFormContext, useFormState, useWatch, type Path } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FEE_BASIS_KINDS, FEE_BASIS_LABELS, type FeeBasisKind } from "@/lib/fees";
import { basisFor, type FeeScheduleFormInput } from "./fee-schedule-form";

type FormPath = Path<FeeScheduleFormInput>;
type ErrorNode = { message?: string; root?: { message?: string } } | undefined;

/** The message at a path; a list's own message sits under `root` once the list is a field array. */
function useErrorAt() {
  const { control } = useFormContext<FeeScheduleFormInput>();
  const { errors } = useFormState({ control });
  return (path: string): string | undefined => {
    const node = get(errors, path) as ErrorNode;
    return node?.message ?? node?.root?.message;
  };
}

const inputId = (idPrefix: string, path: string) => `${idPrefix}-${path.replaceAll(".", "-")}`;

type TextFieldProps = { idPrefix: string; path: FormPath; label: string; hint?: string; className?: string; measure?: boolean } & Pick<
  HTMLAttributes<HTMLInputElement>,
  "inputMode"
> & {
    type?: "text" | "date";
    placeholder?: string;
  };

function TextField({
  idPrefix,
  path,
  label,
  hint,
  className,
  measure = true,
  inputMode = "decimal",
  type = "text",
  placeholder,
}: TextFieldProps) {
  const { register } = useFormContext<FeeScheduleFormInput>();
  const error = useErrorAt()(path);
  const id = inputId(idPrefix, path);
  return (
    <div className={className}>
      <Field label={label} htmlFor={id} error={error} hint={hint}>
        <input
          id={id}
          type={type}
          inputMode={type === "date" ? undefined : inputMode}
          placeholder={placeholder}
          autoComplete="off"
          className={measure ? "input measure" : "input"}
          aria-invalid={Boolean(error)}
          aria-describedby={error ? `${id}-error` : undefined}
          {...register(path)}
        />
      </Field>
    </div>
  );
}

function SizeField({ idPrefix, index }: { idPrefix: string; index: number }) {
  const { register } = useFormContext<FeeScheduleFormInput>();
  const path = `lines.${index}.basis.size` as const;
  const error = useErrorAt()(path);
  const id = inputId(idPrefix, path);
  return (
    <Field label="Size it reads" htmlFor={id} error={error}>
      <select id={id} className="input" aria-invalid={Boolean(error)} {...register(path)}>
        <option value="dc">Module nameplate (DC)</option>
        <option value="ac">Inverter output (AC)</option>
      </select>
    </Field>
  );
}

/** One fee line of the schedule: its name, dates, how it is worked out, and its limits. */
export function FeeLineFields({ idPrefix, index, onRemove }: { idPrefix: string; index: number; onRemove: () => void }) {
  const { control, register, setValue, getValues, clearErrors } = useFormContext<FeeScheduleFormInput>();
  const errorAt = useErrorAt();
  const kind = useWatch({ control, name: `lines.${index}.basis.kind` });
  const number = index + 1;
  const basisPath = `lines.${index}.basis` as const;
  const kindPath = `lines.${index}.basis.kind` as const;
  const kindId = inputId(idPrefix, kindPath);
  const kindError = errorAt(kindPath) ?? errorAt(basisPath);
  const idError = errorAt(`lines.${index}.id`);

  // A new way of working out the fee has other inputs: swap the whole basis, keeping what still applies.
  const changeKind = (next: FeeBasisKind) => {
    setValue(basisPath, basisFor(next, getValues(basisPath)), { shouldDirty: true });
    clearErrors(basisPath);
  };

  return (
    <fieldset className="space-y-4 rounded-md border border-paper-edge bg-white p-3 sm:p-4">
      <legend className="px-1 text-sm font-semibold">Fee line {number}</legend>
      {idError ? (
        <p className="text-sm text-result-fail" role="alert">
          {idError}
        </p>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          idPrefix={idPrefix}
          path={`lines.${index}.name`}
          label="Fee name"
          hint="e.g. Building permit, Plan review, Interconnection application"
          className="sm:col-span-2"
          measure={false}
          inputMode="text"
        />
        <TextField idPrefix={idPrefix} path={`lines.${index}.effectiveFrom`} label="Takes effect" type="date" />
        <TextField
          idPrefix={idPrefix}
          path={`lines.${index}.effectiveUntil`}
          label="Ends (optional)"
          type="date"
          hint="The first day it no longer applies"
        />
        <div className="sm:col-span-2">
          <Field label="How it is worked out" htmlFor={kindId} error={kindError}>
            <select
              id={kindId}
              className="input"
              aria-invalid={Boolean(kindError)}
              {...register(kindPath)}
              onChange={(event) => changeKind(event.target.value as FeeBasisKind)}
            >
              {FEE_BASIS_KINDS.map((k) => (
                <option key={k} value={k}>
                  {FEE_BASIS_LABELS[k]}
                </option>
              ))}
            </select>
          </Field>
        </div>
        {kind === "flat" ? (
          <TextField idPrefix={idPrefix} path={`lines.${index}.basis.amountUsd`} label="Amount ($)" hint="e.g. 150.00" />
        ) : null}
        {kind === "per-kw" ? (
          <>
            <SizeField idPrefix={idPrefix} index={index} />
            <TextField idPrefix={idPrefix} path={`lines.${index}.basis.rateUsdPerKw`} label="Rate ($ per kW)" hint="e.g. 12.00" />
          </>
        ) : null}
        {kind === "bracket-tiers" || kind === "marginal-tiers" ? (
          <>
            <SizeField idPrefix={idPrefix} index={index} />
            {/* Remounted when the line moves or the kind changes, so the tier list always reads its own line. */}
            <TierRows key={`${index}-${kind}`} idPrefix={idPrefix} index={index} kind={kind} />
          </>
        ) : null}
        {kind === "valuation-percent" ? (
          <TextField
            idPrefix={idPrefix}
            path={`lines.${index}.basis.ratePercent`}
            label="Percent of valuation"
            hint="As the schedule prints it: 1.25 means 1.25 %"
          />
        ) : null}
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          idPrefix={idPrefix}
          path={`lines.${index}.minimumUsd`}
          label="Minimum ($, optional)"
          hint="The fee is never less than this"
        />
        <TextField
          idPrefix={idPrefix}
          path={`lines.${index}.maximumUsd`}
          label="Maximum ($, optional)"
          hint="The fee is never more than this"
        />
      </div>
      <Button type="button" variant="quiet" className="px-2" onClick={onRemove}>
        Remove fee line {number}
      </Button>
    </fieldset>
  );
}

/** The rows of a tiered fee; only the last row is open-ended. */
function TierRows({ idPrefix, index, kind }: { idPrefix: string; index: number; kind: "bracket-tiers" | "marginal-tiers" }) {
  const { control } = useFormContext<FeeScheduleFormInput>();
  const errorAt = useErrorAt();
  const tiersPath = `lines.${index}.basis.tiers` as const;
  const tiers = useFieldArray({ control, name: tiersPath });
  const isBracket = kind === "bracket-tiers";
  const [noun, Noun] = isBracket ? ["bracket", "Bracket"] : ["tier", "Tier"];
  const listError = errorAt(tiersPath);
  const addRow = (at: number) =>
    tiers.insert(at, isBracket ? { upToKw: "", amountUsd: "" } : { upToKw: "", rateUsdPerKw: "" }, {
      focusName: `${tiersPath}.${at}.upToKw`,
    });

  return (
    <div className="space-y-3 sm:col-span-2">
      <p className="text-xs text-ink-faint">
        {isBracket
          ? "The whole fee is the amount of the bracket the size falls in."
          : "Each tier's rate applies only to the kW within that tier; the parts are added."}{" "}
        A size exactly on an edge belongs to the row that ends there: up to 10 kW includes 10 kW.
      </p>
      {listError ? (
        <p className="text-sm text-result-fail" role="alert">
          {listError}
        </p>
      ) : null}
      {tiers.fields.map((field, t) => {
        const isLast = t === tiers.fields.length - 1;
        return (
          <fieldset
            key={field.id}
            className="grid items-start gap-3 rounded border border-paper-edge/70 bg-paper/40 p-3 sm:grid-cols-[1fr_1fr_auto]"
          >
            <legend className="px-1 text-xs font-semibold text-ink-soft">
              {Noun} {t + 1}
            </legend>
            <TextField
              idPrefix={idPrefix}
              path={`${tiersPath}.${t}.upToKw`}
              label="Up to (kW)"
              placeholder={isLast ? "and above" : undefined}
              hint={isLast ? "Leave blank on the last row: it covers every larger system" : undefined}
            />
            {isBracket ? (
              <TextField idPrefix={idPrefix} path={`${tiersPath}.${t}.amountUsd`} label="Amount ($)" />
            ) : (
              <TextField idPrefix={idPrefix} path={`${tiersPath}.${t}.rateUsdPerKw`} label="Rate ($ per kW)" />
            )}
            <Button
              type="button"
              variant="quiet"
              className="px-2 sm:mt-6"
              disabled={tiers.fields.length === 1}
              onClick={() => tiers.remove(t)}
            >
              Remove {noun} {t + 1}
            </Button>
          </fieldset>
        );
      })}
      {/* The open-ended row stays last, so a new row goes in above it and needs its upper size. */}
      <Button type="button" variant="secondary" onClick={() => addRow(Math.max(0, tiers.fields.length - 1))}>
        Add a {noun}
      </Button>
    </div>
  );
}
