"use client";

export default function AppError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="panel mx-auto mt-12 max-w-lg text-center">
      <h1 className="text-xl">This page could not be shown</h1>
      <p className="mt-2 text-sm text-ink-soft">
        We are sorry. Nothing you saved was lost; try again, and if it keeps happening tell us the reference below.
      </p>
      {error.digest ? <p className="measure mt-2 text-xs text-ink-faint">Reference {error.digest}</p> : null}
      <button className="mt-4 rounded bg-copper px-4 py-2 text-sm text-white" onClick={reset}>
        Try again
      </button>
    </div>
  );
}
