/** The caution every review screen and document carries. */
export function SafetyNote() {
  return (
    <p className="rounded border border-paper-edge bg-paper-deep/60 p-3 text-xs text-ink-soft">
      These checks do the code arithmetic for the NEC edition the AHJ has adopted; they do not replace a licensed electrician&apos;s or
      engineer&apos;s judgement, the AHJ&apos;s plan review, local amendments or the manufacturers&apos; instructions. PV source circuits
      stay energized in daylight and inverter capacitors hold a charge after shutdown: follow lockout procedures and the equipment&apos;s
      instructions before working on them.
    </p>
  );
}
