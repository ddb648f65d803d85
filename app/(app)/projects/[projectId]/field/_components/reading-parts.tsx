import { clsx } from "clsx";
import { CheckStatusChip } from "@/components/review/check-status";
import type { CommissioningCheck } from "@/lib/engineering/commissioning";

// Small pieces every section of the field record uses: a labelled input,
// one reading with its result under it, and a section panel with a step number.

export function LabelledInput({
  label,
  htmlFor,
  unit,
  error,
  children,
}: {
  label: string;
  htmlFor: string;
  unit?: string;
  error?: string;
  children: React.ReactNode;
}) {
  return (
    <div>
      <label className="label" htmlFor={htmlFor}>
        {label}
        {unit ? <span className="text-ink-faint"> ({unit})</span> : null}
      </label>
      {children}
      {error ? (
        <p className="mt-1 text-sm text-result-fail" role="alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** One reading with its check right under it: the result word, what was found, and what to do. */
export function Reading({
  title,
  inputId,
  hint,
  unit,
  result,
  error,
  bare,
  children,
}: {
  title: string;
  inputId: string;
  hint?: string;
  unit?: string;
  result?: CommissioningCheck;
  error?: string;
  bare?: boolean;
  children: React.ReactNode;
}) {
  return (
    <section className={clsx("space-y-2", !bare && "panel")} aria-label={title}>
      <LabelledInput label={title} htmlFor={inputId} unit={unit} error={error}>
        {children}
      </LabelledInput>
      {hint ? <p className="text-xs text-ink-soft">{hint}</p> : null}
      <ResultLine result={result} />
    </section>
  );
}

export function ResultLine({ result }: { result?: CommissioningCheck }) {
  if (!result) return null;
  return (
    <div
      className="flex items-start gap-2"
      data-testid={`result-${result.id}`}
      data-status={result.status}
      data-reading={result.reading}
      data-waiting={result.waiting ? "true" : undefined}
    >
      <CheckStatusChip status={result.status} />
      <div className="min-w-0 text-sm">
        <p className="break-words text-ink-soft">{result.message}</p>
        {result.fix ? <p className="text-copper-dark">What to do: {result.fix}</p> : null}
        <p className="text-xs text-ink-faint">{result.clause}</p>
      </div>
    </div>
  );
}

/** A numbered step of the work, as a panel with a heading and a line on how to do it. */
export function Step({
  id,
  number,
  title,
  intro,
  children,
}: {
  id: string;
  number: number;
  title: string;
  intro?: React.ReactNode;
  children: React.ReactNode;
}) {
  return (
    <section className="panel space-y-3" aria-labelledby={`${id}-heading`} data-testid={`step-${id}`}>
      <div>
        <h3 id={`${id}-heading`}>
          <span className="measure mr-2 text-copper-dark">{number}.</span>
          {title}
        </h3>
        {intro ? <div className="mt-1 space-y-1 text-xs text-ink-soft">{intro}</div> : null}
      </div>
      {children}
    </section>
  );
}
