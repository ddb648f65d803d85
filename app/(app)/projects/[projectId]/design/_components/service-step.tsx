"use client";

import { useFormContext, useWatch } from "react-hook-form";
import { CONDUCTOR_SIZES, sizeLabel } from "@/lib/engineering/tables/conductor-sizes";
import type { DesignFormValues } from "@/lib/schemas/design";
import { SERVICE_VOLTAGES_V } from "@/lib/schemas/design-options";
import { CheckboxInput, MATERIALS, SelectInput, TextInput, YES_NO, options, type Issues } from "./design-fields";

const SIZES = options(CONDUCTOR_SIZES, (s) => sizeLabel(s as (typeof CONDUCTOR_SIZES)[number]));

function Section({ title, children, hint }: { title: string; hint?: string; children: React.ReactNode }) {
  return (
    <section className="space-y-3 rounded border border-paper-edge p-3">
      <h3 className="font-semibold">{title}</h3>
      {hint ? <p className="text-xs text-ink-faint">{hint}</p> : null}
      {children}
    </section>
  );
}

export function ServiceStep({ issues }: { issues: Issues }) {
  const { control } = useFormContext<DesignFormValues>();
  const s = useWatch({ control, name: "service" }) ?? {};
  const inverterLines = useWatch({ control, name: "equipment.inverters" }) ?? [];
  const loadSide = s.connection !== "supply-side";
  const onFeeder = loadSide && (s.loadSideAt === "feeder" || s.loadSideAt === "feed-through");
  const separateSwitch = s.pvDisconnectKind === "switch" || s.pvDisconnectKind === "fused-switch";

  return (
    <div className="space-y-5">
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectInput
          name="service.voltageV"
          label="Service voltage"
          options={options(SERVICE_VOLTAGES_V, (v) => `${v} V`)}
          issues={issues}
        />
        <SelectInput
          name="service.phase"
          label="Phases"
          options={[
            { value: "1", label: "Single phase" },
            { value: "3", label: "Three phase" },
          ]}
          issues={issues}
        />
        <TextInput name="service.busbarA" label="Busbar rating" suffix="A" inputMode="numeric" issues={issues} />
        <TextInput
          name="service.mainBreakerA"
          label="Main breaker"
          suffix="A"
          inputMode="numeric"
          issues={issues}
          hint="Leave empty for a main-lug panel."
        />
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
        <TextInput
          name="service.otherBreakersA"
          label="Other breakers on the bus"
          inputMode="text"
          issues={issues}
          hint="For the sum rule, e.g. 20, 20, 30. Leave empty if not used."
        />
      </div>
      {loadSide ? (
        <Section title="Where the PV breaker lands">
          <div className="grid gap-4 sm:grid-cols-2">
            <SelectInput
              name="service.loadSideAt"
              label="Connection on"
              options={[
                { value: "busbar", label: "The panel busbar" },
                { value: "feeder", label: "A feeder" },
                { value: "feed-through", label: "A busbar with feed-through lugs" },
              ]}
              issues={issues}
            />
            <SelectInput
              name="service.panelFeed"
              label="Panel fed at"
              options={[
                { value: "end", label: "One end of the busbar" },
                { value: "center", label: "The center (center-fed)" },
              ]}
              issues={issues}
            />
          </div>
          <CheckboxInput
            name="service.pvBreakerAtOppositeEnd"
            label="The PV breaker sits at the opposite end of the busbar from the main (on a center-fed bus: at one end)"
            hint="Needed for the 120 % rule."
          />
          {onFeeder ? (
            <div className="grid gap-4 sm:grid-cols-2">
              <TextInput
                name="service.feederAmpacityA"
                label={s.loadSideAt === "feed-through" ? "Feed-through conductor ampacity" : "Feeder ampacity"}
                suffix="A"
                issues={issues}
              />
              <TextInput
                name="service.feederOcpdA"
                label="Device protecting it at the supply end"
                suffix="A"
                inputMode="numeric"
                issues={issues}
                hint={s.loadSideAt === "feed-through" ? "Empty: the panel's main breaker" : undefined}
              />
              <TextInput
                name="service.feederLoadSideOcpdA"
                label="Device on its load side, if any"
                suffix="A"
                inputMode="numeric"
                issues={issues}
              />
              <TextInput name="service.feederTapAmpacityA" label="Smallest tap from it, if any" suffix="A" issues={issues} />
              {s.loadSideAt === "feeder" ? (
                <CheckboxInput name="service.feederAtOppositeEnd" label="The connection is at the end of the feeder away from its device" />
              ) : null}
            </div>
          ) : null}
        </Section>
      ) : (
        <Section title="Supply-side conductors" hint="From the tap on the service conductors to the PV overcurrent device.">
          <div className="grid gap-4 sm:grid-cols-3">
            <SelectInput name="service.supplyConductorSize" label="Size" options={SIZES} empty="Choose" issues={issues} />
            <SelectInput name="service.supplyConductorMaterial" label="Material" options={MATERIALS} empty="Choose" issues={issues} />
            <TextInput name="service.supplyTapLengthFt" label="Length to the overcurrent device" suffix="ft" issues={issues} />
          </div>
        </Section>
      )}
      <Section title="Disconnect and rapid shutdown">
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectInput
            name="service.pvDisconnectKind"
            label="PV system disconnect"
            options={[
              { value: "pv-breaker", label: "The PV breaker" },
              { value: "switch", label: "A separate AC disconnect switch" },
              { value: "fused-switch", label: "A fused disconnect switch" },
            ]}
            empty="Choose"
            issues={issues}
          />
          <TextInput name="service.pvDisconnectLocation" label="PV disconnect location" inputMode="text" issues={issues} />
          {separateSwitch ? (
            <>
              <TextInput name="service.pvDisconnectRatingA" label="Switch rating" suffix="A" inputMode="numeric" issues={issues} />
              <TextInput name="service.pvDisconnectVoltageV" label="Switch voltage rating" suffix="V" inputMode="numeric" issues={issues} />
              <SelectInput
                name="service.pvDisconnectAccessible"
                label="Readily accessible"
                options={YES_NO}
                empty="Choose"
                issues={issues}
              />
            </>
          ) : null}
          <SelectInput
            name="service.rsdInitiatorKind"
            label="Rapid shutdown started by"
            options={[
              { value: "service-disconnect", label: "The service disconnect" },
              { value: "pv-disconnect", label: "The PV system disconnect" },
              { value: "switch", label: "A rapid shutdown switch" },
            ]}
            empty="Choose"
            issues={issues}
          />
          <SelectInput
            name="service.rsdInitiatorOutside"
            label="Initiator outside, readily accessible"
            options={YES_NO}
            empty="Choose"
            issues={issues}
          />
          <TextInput name="service.serviceLocation" label="Service panel location" inputMode="text" issues={issues} />
        </div>
      </Section>
      <Section
        title="Grounding"
        hint="Only where the design adds a grounding electrode conductor; the service conductor sizes it by Table 250.66."
      >
        <div className="grid gap-4 sm:grid-cols-3">
          <SelectInput name="service.gecSize" label="Grounding electrode conductor" options={SIZES} empty="None added" issues={issues} />
          <SelectInput name="service.gecMaterial" label="Its material" options={MATERIALS} empty="Choose" issues={issues} />
          <SelectInput
            name="service.gecElectrode"
            label="To"
            options={[
              { value: "rod-pipe-plate", label: "A rod, pipe or plate" },
              { value: "other", label: "Another electrode" },
            ]}
            empty="Choose"
            issues={issues}
          />
          <SelectInput
            name="service.serviceConductorSize"
            label="Service-entrance conductor"
            options={SIZES}
            empty="Not entered"
            issues={issues}
          />
          <SelectInput name="service.serviceConductorMaterial" label="Its material" options={MATERIALS} empty="Choose" issues={issues} />
        </div>
      </Section>
      {inverterLines.length > 1 ? (
        <Section title="AC combiner" hint="Where branch circuits are joined before the service panel: its busbar carries only the sources.">
          <TextInput name="service.combinerBusbarA" label="Combiner busbar rating" suffix="A" inputMode="numeric" issues={issues} />
        </Section>
      ) : null}
    </div>
  );
}
