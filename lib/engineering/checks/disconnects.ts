import { atLeast, fmt, makeCheck } from "../check-result";
import { clause, clauses } from "../clauses";
import { microInverters, totalInverterOutputA } from "../design-lookup";
import type { CheckResult, Design, Site } from "../types";
import { rapidShutdownMethod } from "./rapid-shutdown";

const SWITCH_NAMES = {
  "pv-breaker": "the PV breaker",
  switch: "a separate disconnect switch",
  "fused-switch": "a fused disconnect switch",
} as const;

/**
 * 690.13: the PV system disconnecting means, at a readily accessible location, rated for the circuit's
 * current and voltage. The PV breaker of a load-side connection may serve; a separate switch needs its
 * ratings entered. Unknown entries warn and name the field.
 */
export function checkPvSystemDisconnect(design: Design, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const d = design.pvDisconnect;
  const outputA = totalInverterOutputA(design);
  const base = { id: "pv-disconnect", title: "PV system disconnect", edition };
  if (!d) {
    return [
      makeCheck({
        ...base,
        status: "warn",
        value: null,
        limit: null,
        unit: "",
        clause: clause("pvDisconnect", edition),
        field: "pvDisconnect.kind",
        message:
          "The design does not say what the PV system disconnect is (the PV breaker, or a separate switch), so its location and ratings are not checked.",
        fix: "Choose the PV system disconnect in the service step and enter its ratings.",
      }),
    ];
  }
  if (d.kind === "pv-breaker") {
    const ok = design.service.connection === "load-side";
    return [
      makeCheck({
        ...base,
        status: ok ? "pass" : "fail",
        value: null,
        limit: null,
        unit: "",
        clause: clauses(edition, "pvDisconnect", "pvDisconnectRatings"),
        message: ok
          ? `The ${design.service.pvBreakerA} A PV breaker in the service panel is the PV system disconnect; it is rated for the circuit it protects and is reached where the service panel is.`
          : "A supply-side connection has no PV breaker in the panel: its own disconnect must be named as the PV system disconnect.",
        fix: ok ? undefined : "Choose a fused disconnect switch (or a separate switch) as the PV system disconnect.",
        field: ok ? undefined : "pvDisconnect.kind",
      }),
    ];
  }
  const results: CheckResult[] = [];
  const name = SWITCH_NAMES[d.kind];
  // A fused switch carries the PV fuses: it must be rated for them; a plain switch at least for the circuit's maximum current.
  const neededA = d.kind === "fused-switch" ? design.service.pvBreakerA : outputA;
  const ratingBase = {
    id: "pv-disconnect-rating",
    title: "PV system disconnect rating",
    clause: clause("pvDisconnectRatings", edition),
    edition,
  };
  if (d.ratingA === undefined || d.voltageRatingV === undefined) {
    results.push(
      makeCheck({
        ...ratingBase,
        status: "warn",
        value: d.ratingA ?? null,
        limit: neededA,
        unit: "A",
        field: d.ratingA === undefined ? "pvDisconnect.ratingA" : "pvDisconnect.voltageRatingV",
        message: `The ${d.ratingA === undefined ? "ampere" : "voltage"} rating of ${name} is not entered, so it cannot be checked against the ${fmt(neededA)} A, ${design.inverters[0]!.acVoltageV} V circuit.`,
        fix: "Enter the switch's ampere and voltage ratings.",
      }),
    );
  } else {
    const ampsOk = atLeast(d.ratingA, neededA);
    const voltsOk = atLeast(d.voltageRatingV, Math.max(...design.inverters.map((i) => i.acVoltageV)));
    results.push(
      makeCheck({
        ...ratingBase,
        status: ampsOk && voltsOk ? "pass" : "fail",
        value: d.ratingA,
        limit: neededA,
        unit: "A",
        message: `${name[0]!.toUpperCase()}${name.slice(1)} is rated ${d.ratingA} A, ${d.voltageRatingV} V; it must be rated for ${d.kind === "fused-switch" ? `the ${neededA} A fuses it holds` : `the inverters' ${fmt(neededA)} A output`} at ${design.inverters[0]!.acVoltageV} V.`,
        fix:
          ampsOk && voltsOk ? undefined : `Use a switch rated at least ${Math.ceil(neededA)} A and ${design.inverters[0]!.acVoltageV} V.`,
      }),
    );
  }
  const access = d.readilyAccessible;
  results.push(
    makeCheck({
      id: "pv-disconnect-location",
      title: "PV system disconnect location",
      status: access === true ? "pass" : access === false ? "fail" : "warn",
      value: null,
      limit: null,
      unit: "",
      clause: clause("pvDisconnectLocation", edition),
      edition,
      message:
        access === true
          ? `${name[0]!.toUpperCase()}${name.slice(1)} is at a readily accessible location${design.service.pvDisconnectLocation ? ` (${design.service.pvDisconnectLocation})` : ""}.`
          : access === false
            ? `${name[0]!.toUpperCase()}${name.slice(1)} is not readily accessible; the PV system disconnect must be.`
            : `The design does not say whether ${name} is readily accessible.`,
      fix:
        access === true
          ? undefined
          : "Place the disconnect where it can be reached quickly without ladders or removing obstacles, and record that in the design.",
      field: access === true ? undefined : "pvDisconnect.readilyAccessible",
    }),
  );
  return results;
}

// 690.15: string inverters need a way to isolate their DC inputs; micro-inverters' connectors serve (from memory).
export function checkEquipmentDisconnects(design: Design, site: Site): CheckResult[] {
  const edition = site.necEdition;
  const micro = new Set(microInverters(design).map((i) => i.id));
  return design.inverters
    .filter((i) => !micro.has(i.id))
    .map((inv) => {
      const known = inv.dcDisconnect;
      return makeCheck({
        id: `dc-disconnect:${inv.id}`,
        title: `DC disconnect at the ${inv.model}`,
        status: known === true ? "pass" : "warn",
        value: null,
        limit: null,
        unit: "",
        clause: clause("equipmentDisconnect", edition),
        edition,
        message:
          known === true
            ? `The ${inv.model} has an integrated DC disconnect to isolate it from its strings.`
            : known === false
              ? `The ${inv.model} has no integrated DC disconnect: a separate DC disconnect must be shown within sight of the inverter and within 10 ft of it.`
              : `The catalog does not say whether the ${inv.model} has an integrated DC disconnect.`,
        fix:
          known === true
            ? undefined
            : known === false
              ? "Show a DC disconnect within sight of the inverter and within 10 ft of it on the plans."
              : "Enter whether the inverter has an integrated DC disconnect, from its data sheet.",
        field: known === undefined ? `inverters.${inv.id}.dcDisconnect` : undefined,
      });
    });
}

/**
 * 690.12(C): the rapid shutdown initiation device is the service disconnect, the PV system disconnect or
 * a readily accessible switch; from 2020 on, at one- and two-family dwellings it must be outside the
 * building at a readily accessible location (from memory).
 */
export function checkRapidShutdownInitiator(design: Design, site: Site): CheckResult[] {
  if (design.mount === "ground" || rapidShutdownMethod(design) === "none") return [];
  const edition = site.necEdition;
  const initiator = design.rapidShutdownInitiator;
  const outsideRequired = edition !== 2017 && site.isDwelling;
  const base = {
    id: "rapid-shutdown-initiator",
    title: "Rapid shutdown initiator",
    value: null,
    limit: null,
    unit: "",
    clause: clause("rapidShutdownInitiator", edition),
    edition,
  };
  if (!initiator) {
    return [
      makeCheck({
        ...base,
        status: "warn",
        field: "rapidShutdownInitiator.kind",
        message:
          "The design does not say what starts rapid shutdown (the service disconnect, the PV system disconnect or a separate switch).",
        fix: "Choose the rapid shutdown initiator in the service step.",
      }),
    ];
  }
  const what = {
    "service-disconnect": "the service disconnect",
    "pv-disconnect": "the PV system disconnect",
    switch: "a rapid shutdown switch",
  }[initiator.kind];
  if (!outsideRequired) {
    return [makeCheck({ ...base, status: "pass", message: `Rapid shutdown is started by ${what}.` })];
  }
  const outside = initiator.outsideReadilyAccessible;
  return [
    makeCheck({
      ...base,
      status: outside === true ? "pass" : outside === false ? "fail" : "warn",
      message:
        outside === true
          ? `Rapid shutdown is started by ${what}, outside the dwelling at a readily accessible location.`
          : outside === false
            ? `Rapid shutdown is started by ${what}, which is not outside the dwelling at a readily accessible location; NEC ${edition} asks for that at one- and two-family dwellings.`
            : `Rapid shutdown is started by ${what}; the design does not say whether it is outside the dwelling at a readily accessible location.`,
      fix:
        outside === true
          ? undefined
          : "Place the initiator outside the building where it can be reached quickly, and record that in the design.",
      field: outside === true ? undefined : "rapidShutdownInitiator.outsideReadilyAccessible",
    }),
  ];
}
