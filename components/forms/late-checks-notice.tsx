import type { LateModule } from "./use-module-after-hydration";

/**
 * What a form says while its live checks have not loaded and something was changed: that it is checking,
 * or, when they could not load, that the checks shown are those of `shown` and a reload checks the input.
 */
export function LateChecksNotice({ state, changed, shown }: { state: LateModule<unknown>; changed: boolean; shown: string }) {
  if (!changed || typeof state === "object") return null;
  if (state === "loading") return <p className="mb-2 text-xs text-ink-faint">Checking your changes…</p>;
  return (
    <p className="mb-2 text-sm font-medium text-ink" role="alert">
      The live checks could not load, so these are the checks of {shown}. Your input is still saved; reload the page to check it.
    </p>
  );
}
