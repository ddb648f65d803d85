// The steps a packet generation goes through, each with its share of the work, so the progress a
// coordinator watches follows what the worker is really doing. Pure: the worker writes each step
// as it starts it.

export type GenerationStepKind = "sheet" | "datasheet" | "assemble" | "store" | "verify";

export type GenerationStep = {
  kind: GenerationStepKind;
  /** What is happening, in the words the Documents page shows. */
  text: string;
  /** Percent of the work done when this step starts: 0 for the first, below 100 for all. */
  progress: number;
};

// Relative cost of each step, measured on the demo permit packet (8 sheets, 2 data sheets): drawing a
// sheet took 70–290 ms, reading a data sheet from storage about 40 ms, putting the pages together,
// storing and reading back the PDF 30–80 ms each.
const WEIGHT: Record<GenerationStepKind, number> = { sheet: 5, datasheet: 1, assemble: 1, store: 1, verify: 1 };

/** The step text column holds 80 characters; long titles are cut with an ellipsis. */
export const STEP_TEXT_MAX = 80;

function fit(text: string): string {
  return text.length <= STEP_TEXT_MAX ? text : `${text.slice(0, STEP_TEXT_MAX - 1).trimEnd()}…`;
}

/**
 * Every step of one generation, in the order the worker takes them: each sheet drawn, each data sheet
 * read, the pages put together, the PDF stored, the stored copy checked. Progress only grows.
 */
export function planGenerationSteps({
  sheetTitles,
  datasheetTitles,
}: {
  sheetTitles: readonly string[];
  datasheetTitles: readonly string[];
}): GenerationStep[] {
  const pageWord = (n: number) => `${n} ${n === 1 ? "sheet" : "sheets"}`;
  const steps: Omit<GenerationStep, "progress">[] = [
    ...sheetTitles.map((title, i) => ({ kind: "sheet" as const, text: `Drawing sheet ${i + 1} of ${sheetTitles.length}: ${title}` })),
    ...datasheetTitles.map((title, i) => ({
      kind: "datasheet" as const,
      text: `Reading data sheet ${i + 1} of ${datasheetTitles.length}: ${title}`,
    })),
    {
      kind: "assemble",
      text: datasheetTitles.length
        ? `Putting ${pageWord(sheetTitles.length)} and ${datasheetTitles.length === 1 ? "1 data sheet" : `${datasheetTitles.length} data sheets`} together`
        : `Putting ${pageWord(sheetTitles.length)} together`,
    },
    { kind: "store", text: "Storing the PDF" },
    { kind: "verify", text: "Checking the stored copy against its checksum" },
  ];
  const total = steps.reduce((sum, step) => sum + WEIGHT[step.kind], 0);
  let done = 0;
  return steps.map((step) => {
    // Floor, so no step before the last claims the work is finished.
    const progress = Math.floor((100 * done) / total);
    done += WEIGHT[step.kind];
    return { ...step, text: fit(step.text), progress };
  });
}
