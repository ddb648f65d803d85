import { test as base } from "@playwright/test";
import { makeTargets, type Targets } from "./targets";

/** The security specs share one set of targets per worker: making them generates a packet and pays a fee. */
export const test = base.extend<object, { targets: Targets }>({
  targets: [
    async ({ browser }, use) => {
      await use(await makeTargets(browser));
    },
    { scope: "worker", timeout: 240_000 },
  ],
});
export { expect } from "@playwright/test";
