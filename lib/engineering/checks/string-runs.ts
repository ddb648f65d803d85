import { makeCheck } from "../check-result";
import { DESIGN_CONSISTENCY, clause } from "../clauses";
import { runsCarryingString } from "../design-lookup";
import type { CheckResult, Design, Site } from "../types";

/** Every string needs a DC run: without one its conductors go unchecked. */
export function checkStringsHaveRuns(design: Design, site: Site): CheckResult[] {
  return design.strings
    .filter((s) => runsCarryingString(design, s.id).length === 0)
    .map((s) =>
      makeCheck({
        id: `string-run:${s.id}`,
        title: `String ${s.id} conductors`,
        status: "warn",
        value: null,
        limit: null,
        unit: "",
        clause: `${clause("conductorSizing", site.necEdition)}; ${DESIGN_CONSISTENCY}`,
        edition: site.necEdition,
        message: `No conductor run carries string ${s.id}, so its conductors, their protection and their voltage drop are not checked.`,
        fix: `Add a DC run for string ${s.id}, or include it in the run that shares its raceway.`,
        field: `strings.${s.id}`,
      }),
    );
}
