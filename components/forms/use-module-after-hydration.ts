"use client";

import { useEffect, useState } from "react";

/** A module loaded after hydration: loaded, still on its way, or given up on. */
export type LateModule<T> = { module: T } | "loading" | "failed";

// A chunk that never arrives does not always reject the import: after this long the form says so.
const GIVE_UP_MS = 15_000;

/**
 * Loads a heavy module (a schema, the checks) with `import()` once the page is interactive, off the
 * first-load path. The page shows what the server worked out until it arrives; a late arrival still
 * takes over from "failed". `load` is called once.
 */
export function useModuleAfterHydration<T>(load: () => Promise<T>): LateModule<T> {
  const [state, setState] = useState<LateModule<T>>("loading");
  useEffect(() => {
    let current = true;
    load().then(
      (module) => current && setState({ module }),
      () => current && setState("failed"),
    );
    const giveUp = setTimeout(() => current && setState((s) => (s === "loading" ? "failed" : s)), GIVE_UP_MS);
    return () => {
      current = false;
      clearTimeout(giveUp);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- loaded once per mount
  }, []);
  return state;
}
