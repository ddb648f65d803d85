"use client";

export default function SignError({ error }: { error: Error & { digest?: string } }) {
  return (
    <div className="panel mx-auto mt-12 max-w-lg text-center">
      <h1 className="text-xl">This page could not be shown</h1>
      <p className="mt-2 text-sm text-ink-soft">
        We are sorry. Nothing was signed. Try again in a moment; if it keeps happening, tell the sender the reference below.
      </p>
      {error.digest ? <p className="measure mt-2 text-xs text-ink-faint">Reference {error.digest}</p> : null}
    </div>
  );
}
