"use client";

import { SERVICE_VOLTAGES_V } from "@/lib/schemas/design";
import { CheckboxInput, SelectInput, TextInput, options, type Issues } from "./design-fields";

export function ServiceStep({ issues }: { issues: Issues }) {
  return (
    <div className="space-y-5">
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectInput name="service.voltageV" label="Service voltage" options={options(SERVICE_VOLTAGES_V, (v) => `${v} V`)} issues={issues} />
        <SelectInput name="service.phase" label="Phases" options={[{ value: "1", label: "Single phase" }, { value: "3", label: "Three phase" }]} issues={issues} />
        <TextInput name="service.busbarA" label="Busbar rating" suffix="A" inputMode="numeric" issues={issues} />
        <TextInput name="service.mainBreakerA" label="Main breaker" suffix="A" inputMode="numeric" issues={issues} hint="Leave empty for a main-lug panel." />
      </div>
      <SelectInput
        name="service.connection"
        label="Point of connection"
        options={[
          { value: "load-side", label: "Load side: backfed breaker in the panel" },
          { value: "supply-side", label: "Supply side: tap between meter and main" },
        ]}
        issues={issues}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextInput name="service.pvBreakerA" label="PV breaker (or supply-side OCPD)" suffix="A" inputMode="numeric" issues={issues} />
        <TextInput name="service.otherBreakersA" label="Other breakers on the bus" inputMode="text" issues={issues} hint="For the sum rule, e.g. 20, 20, 30. Leave empty if not used." />
      </div>
      <CheckboxInput name="service.pvBreakerAtOppositeEnd" label="The PV breaker sits at the opposite end of the busbar from the main" hint="Needed for the 120 % rule." />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextInput name="service.serviceLocation" label="Service panel location" inputMode="text" issues={issues} />
        <TextInput name="service.pvDisconnectLocation" label="PV AC disconnect location" inputMode="text" issues={issues} />
      </div>
    </div>
  );
}
