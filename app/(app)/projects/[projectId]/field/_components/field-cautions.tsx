/** The cautions the installer reads before taking readings; they defer to the maker's instructions and licensed practice. */
export function FieldCautions({ storage = false }: { storage?: boolean }) {
  return (
    <aside
      className="rounded border border-result-warn/50 bg-result-warn/10 p-3 text-sm text-ink"
      aria-label="Safety cautions"
      data-testid="field-cautions"
    >
      <p className="font-semibold">Before you measure</p>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        <li>
          PV conductors are energized whenever light reaches the modules, even with every switch open. Treat DC wiring as live in daylight.
        </li>
        <li>
          Inverter capacitors hold a charge after shutdown. Keep clear of DC terminals until the inverter reports a safe DC voltage, and
          confirm with a meter rated for the circuit.
        </li>
        {storage ? (
          <li>This system has batteries: they stay energized when the array and the grid are off, and keep the backup loads panel live.</li>
        ) : null}
        <li>
          Wear the protective equipment the task calls for and follow the equipment maker&apos;s instructions, the NEC edition and local
          amendments the AHJ enforces, and your licensed practice. These checks support that judgement; they do not replace it.
        </li>
      </ul>
    </aside>
  );
}
