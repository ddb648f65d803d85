"use client";

export default function RootError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto max-w-lg px-6 py-24 text-center">
      <h1>Something went wrong</h1>
      <p className="mt-3 text-ink-soft">We are sorry: the page could not be shown. Nothing you saved was lost.</p>
      {error.digest ? <p className="measure mt-2 text-xs text-ink-faint">Reference {error.digest}</p> : null}
      <button className="mt-6 rounded bg-copper px-4 py-2 text-white" onClick={reset}>
        Try again
      </button>
    </main>
  );
}
