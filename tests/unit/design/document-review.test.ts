import fc from "fast-check";
import { describe, expect, it, test } from "vitest";
import type { DesignDocumentInput } from "@/lib/design/document";
import { reviewDocument, reviewDocumentOrThrow } from "@/lib/design/document-review";
import type { ReviewJson } from "@/lib/design/review-json";
import { AppError } from "@/lib/errors";
import { exampleDocument } from "./document-fixtures";

const review = (doc: unknown = exampleDocument()): ReviewJson => {
  const out = reviewDocument(doc);
  if (!out.ok) throw new Error(JSON.stringify(out.problems));
  return out.review;
};
const check = (r: ReviewJson, id: string) => r.checks.find((c) => c.id === id)!;

describe("reviewDocument: a hand-worked example", () => {
  const r = review();

  it("string S1: NEC 2020 690.7(A)(1) coefficient method", () => {
    // Voc,cold = Voc × [1 + (Tmin − 25) × αVoc/100] = 40 × [1 + (−20 − 25) × (−0.28)/100] = 40 × 1.126 = 45.04 V
    // String = 10 × 45.04 = 450.4 V ≤ 600 V, the 690.7 limit for a one- or two-family dwelling.
    expect(r.strings[0]).toMatchObject({ id: "S1", moduleVocColdV: 45.04, stringVocColdV: 450.4 });
    expect(check(r, "string-voltage:S1")).toMatchObject({ value: 450.4, limit: 600, status: "pass", codeRef: "NEC 2020 690.7(A)" });
  });

  it("string S1: NEC 690.8(A) current and a 240.6(A) fuse", () => {
    // Maximum circuit current = 1.25 × Isc = 1.25 × 12.2 = 15.25 A.
    // A fuse must be at least 1.25 × 15.25 = 19.06 A: the next standard rating is 20 A.
    expect(r.strings[0]).toMatchObject({ maxCircuitCurrentA: 15.25, minOcpdA: 20 });
    // 690.12 with a shutdown device behind each module holding 1 V (common practice): 10 × 1 = 10 V.
    expect(r.strings[0].shutdownStringV).toBe(10);
  });

  it("run r1: 690.8(B) ampacity, Table 310.16 and Table 310.15(B)(1), Chapter 9 Table 8 drop", () => {
    // Required before conditions of use: 1.25 × 15.25 = 19.06 A (10 AWG Cu at 75 °C terminals: 35 A).
    // Corrected: 40 A (90 °C column) × 0.96 (33 °C, 90 °C insulation) = 38.4 A; 1 in above the roof adds nothing (≥ 7/8 in).
    // Drop: 2 × 100 ft × 1.24 Ω/kft × 11.9 A (Imp) / 1000 = 2.95 V, over 10 × 33.6 V = 336 V: 0.88 %.
    // EGC: no fuse, so NEC 2020 690.45 assumes a device per 690.9(B): 1.25 × 15.25 = 19.06 → 20 A; Table 250.122 up to 20 A: 12 AWG copper.
    // One string alone in the run: one circuit, two current-carrying conductors; the 75 °C terminals as entered.
    expect(r.runs[0]).toEqual({
      id: "r1",
      circuits: 1,
      currentCarrying: 2,
      terminalC: 75,
      designCurrentA: 15.25,
      requiredAmpacityA: 19.06,
      correctedAmpacityA: 38.4,
      voltageDropV: 2.95,
      voltageDropPct: 0.88,
      minEgc: "12 AWG",
      status: "warn",
    });
    expect(check(r, "ampacity-conditions:r1")).toMatchObject({ value: 38.4, limit: 15.25 });
    expect(check(r, "voltage-drop:r1").value).toBe(0.88);
    expect(check(r, "egc:r1")).toMatchObject({ status: "warn", fix: "Add a 12 AWG copper equipment grounding conductor." });
  });

  it("run r3: inverter output, 705.28 and Chapter 9 Tables 1, 4 and 5", () => {
    // 32 A continuous; 1.25 × 32 = 40 A; 8 AWG Cu 55 A × 0.96 = 52.8 A.
    // Drop: 2 × 50 × 0.778 × 32 / 1000 = 2.49 V of 240 V = 1.04 %.
    // Fill: 2 × 0.0366 in² over 3/4 EMT's 0.213 / 0.4 = 0.5325 in² = 13.75 % (31 % allowed for two wires).
    expect(r.runs[2]).toMatchObject({
      designCurrentA: 32,
      requiredAmpacityA: 40,
      correctedAmpacityA: 52.8,
      voltageDropV: 2.49,
      voltageDropPct: 1.04,
      minEgc: "10 AWG",
      fillPct: 13.75,
    });
    expect(check(r, "conduit-fill:r3")).toMatchObject({ value: 13.75, limit: 31 });
  });

  it("the inverter output, the 705.12 120 % rule and the ratings", () => {
    // 705.30(B): 1.25 × 32 = 40 A. 120 % rule: 1.25 × 32 + 200 = 240 A ≤ 1.2 × 200 = 240 A.
    // Largest PV breaker under it: 240 − 200 = 40 A.
    expect(r.inverterOutputs).toEqual([{ inverterId: "inv-1", continuousA: 32, minOcpdA: 40 }]);
    expect(r.pointOfConnection).toEqual({ method: "load-side", rule: "120%", maxPvBreakerA: 40, status: "pass" });
    // 20 × 400 W = 8 kW DC; 7.6 kW AC; 8 / 7.6 = 1.05. No peak sun hours, so no production estimate.
    expect(r.ratings).toEqual({ dcKw: 8, acKw: 7.6, dcAcRatio: 1.05 });
  });

  it("is as bad as its worst check: every entry the document leaves out is a warning naming its field", () => {
    expect(r.status).toBe("warn");
    expect(r.checks.filter((c) => c.status !== "pass").map((c) => [c.id, c.field])).toEqual([
      ["system-voltage:module", "module.maxSystemVoltageV"],
      ["system-voltage:device", "moduleLevelDevice.maxSystemVoltageV"],
      ["arc-fault:inv-1", "inverters.inv-1.dcArcFaultProtection"],
      ["ground-fault:inv-1", "inverters.inv-1.dcGroundFaultProtection"],
      // both strings join at the inverter's one input: without the series fuse rating fusing cannot be settled (690.9(A))
      ["ocpd-rating:r1", "module.maxSeriesFuseA"],
      ["egc:r1", "runs.r1.egc"],
      ["wiring-inside:r1", "runs.r1.insideBuilding"],
      ["ocpd-rating:r2", "module.maxSeriesFuseA"],
      ["egc:r2", "runs.r2.egc"],
      ["wiring-inside:r2", "runs.r2.insideBuilding"],
      ["egc:r3", "runs.r3.egc"],
      ["pv-disconnect", "pvDisconnect.kind"],
      ["dc-disconnect:inv-1", "inverters.inv-1.dcDisconnect"],
      ["rapid-shutdown-initiator", "rapidShutdownInitiator.kind"],
    ]);
  });

  it("has labels in the code's words with our explanation, and no roof checks without roof planes", () => {
    expect(r.checks.some((c) => c.id.startsWith("roof-") || c.id === "module-count")).toBe(false);
    expect(r.labels).toContainEqual(
      expect.objectContaining({
        codeRef: "NEC 2020 690.53",
        title: "Solar DC circuit ratings",
        values: { maxDcVoltageV: 450.4 },
        prescribedWording: false,
      }),
    );
    const rsd = r.labels.find((l) => l.codeRef === "NEC 2020 690.56(C)(1)(a)")!;
    expect(rsd).toMatchObject({ prescribedWording: true });
    expect(rsd.text).toContain("SOLAR PV SYSTEM IS EQUIPPED WITH RAPID SHUTDOWN");
    expect(rsd.explanation.length).toBeGreaterThan(20);
  });

  it("a document that says everything the review asks passes", () => {
    const doc = exampleDocument();
    doc.modules[0] = { ...doc.modules[0]!, maxSystemVoltageV: 1000, maxSeriesFuseA: 25 };
    doc.optimizers![0] = { ...doc.optimizers![0]!, maxSystemVoltageV: 1000 };
    doc.inverters[0] = { ...doc.inverters[0]!, dcArcFaultProtection: true, dcGroundFaultProtection: true, dcDisconnect: true };
    doc.runs = doc.runs!.map((run) => ({
      ...run,
      egc: { size: run.circuit === "ac-output" ? "10 AWG" : "6 AWG" },
      ...(run.circuit === "ac-output" ? {} : { insideBuilding: false }),
    }));
    doc.pvDisconnect = { kind: "pv-breaker" };
    doc.rapidShutdownInitiator = { kind: "service-disconnect", outsideReadilyAccessible: true };
    const ok = review(doc);
    expect(ok.checks.filter((c) => c.status !== "pass")).toEqual([]);
    expect(ok.status).toBe("pass");
  });

  // Issue 11 items 1 and 4 of the design editor: two strings in one raceway are two circuits, four conductors.
  it("two strings in one raceway: one run, two circuits, four current-carrying conductors, each string's own current", () => {
    const doc = exampleDocument();
    doc.runs = [
      {
        ...doc.runs![0]!,
        id: "r1",
        stringId: undefined,
        stringIds: ["S1", "S2"],
        currentCarrying: undefined,
        conduit: { type: "EMT", tradeSize: "3/4" },
        insulation: "THWN-2",
        aboveRoofIn: undefined,
      },
      doc.runs![2]!,
    ];
    const two = review(doc);
    // 40 A × 0.96 (33 °C) × 0.8 (4 conductors, Table 310.15(C)(1)) = 30.72 A for each string's 15.25 A
    expect(two.runs[0]).toMatchObject({ circuits: 2, currentCarrying: 4, designCurrentA: 15.25, correctedAmpacityA: 30.72 });
    // 4 × 0.0211 in² (10 AWG THWN-2) = 0.0844 of 0.5325 in² = 15.85 %
    expect(two.runs[0]!.fillPct).toBe(15.85);
  });

  it("a conduit of wires whose insulation Table 5 does not list asks for their area instead of passing", () => {
    const doc = exampleDocument();
    doc.runs = [{ ...doc.runs![0]!, conduit: { type: "EMT", tradeSize: "3/4" } }, doc.runs![1]!, doc.runs![2]!];
    const c = check(review(doc), "conduit-fill:r1");
    expect(c).toMatchObject({ status: "warn", value: null, field: "runs.r1.wireAreaIn2" });
    doc.runs[0] = { ...doc.runs[0]!, wireAreaIn2: 0.0266 };
    // PV wire 0.0266 in² × 2 = 0.0532 of 0.5325 in² = 9.99 % (31 % allowed for two wires)
    expect(check(review(doc), "conduit-fill:r1")).toMatchObject({ status: "pass", value: 9.99 });
  });

  it("adds the roof checks and the production estimate when the document gives them", () => {
    const doc = exampleDocument();
    doc.roofPlanes = [{ id: "south", moduleCount: 20, attachmentCount: 24, rackingWeightLb: 180 }];
    doc.site.peakSunHours = 5;
    const withRoof = review(doc);
    // (20 × 48.5 + 180) lb / (20 × 21.4) ft² = 1150 / 428 = 2.69 lb/ft².
    expect(check(withRoof, "roof-dead-load:south")).toMatchObject({ value: 2.69, status: "pass" });
    // 8 kW × 5 h × 365 × (1 − 0.14076) = 12 545 kWh (PVWatts v5 default losses, NREL/TP-6A20-62641).
    expect(withRoof.ratings.annualKwh).toBe(12545);
  });
});

describe("reviewDocument: figures equal the checks'", () => {
  it("for every string and run", () => {
    const r = review();
    for (const s of r.strings) expect(check(r, `string-voltage:${s.id}`).value).toBe(s.stringVocColdV);
    for (const run of r.runs) {
      expect(check(r, `ampacity-terminal:${run.id}`).limit).toBe(run.requiredAmpacityA);
      expect(check(r, `ampacity-conditions:${run.id}`)).toMatchObject({ value: run.correctedAmpacityA, limit: run.designCurrentA });
      expect(check(r, `voltage-drop:${run.id}`).value).toBe(run.voltageDropPct);
    }
  });
});

describe("reviewDocument: refusals", () => {
  it("points an engine input error back at the document", () => {
    const doc = exampleDocument();
    doc.strings = [];
    doc.runs = [];
    doc.optimizers = [];
    expect(reviewDocument(doc)).toEqual({
      ok: false,
      problems: [{ path: "strings", message: "The design has a string inverter but no strings." }],
    });
  });

  it("throws a 422 AppError with every problem under its path", () => {
    const doc = exampleDocument() as Record<string, any>;
    doc.runs[2].size = "9 AWG";
    doc.runs[0].stringId = "S9";
    const error = (() => {
      try {
        reviewDocumentOrThrow(doc);
      } catch (e) {
        return e;
      }
    })();
    expect(error).toBeInstanceOf(AppError);
    expect(error).toMatchObject({ code: "INVALID_INPUT", message: expect.stringMatching(/1 problem;/) });
    expect(Object.keys((error as AppError).fieldErrors!)).toEqual(["runs[2].size"]);
  });
});

describe("reviewDocument never throws for any JSON", () => {
  it("whatever the body", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (body) => typeof reviewDocument(body).ok === "boolean"),
      { numRuns: 300 },
    );
  });

  // Replace one field anywhere in a valid document with any JSON value or an extreme number.
  const leafPaths = (value: unknown, path: (string | number)[] = []): (string | number)[][] =>
    value !== null && typeof value === "object"
      ? Object.entries(value).flatMap(([k, v]) => leafPaths(v, [...path, Array.isArray(value) ? Number(k) : k]))
      : [path];
  const base = exampleDocument();
  base.roofPlanes = [{ id: "south", moduleCount: 20, attachmentCount: 24, rackingWeightLb: 180 }];
  const paths = leafPaths(base);
  const extreme = fc.oneof(
    fc.jsonValue(),
    fc.double({ noNaN: true }),
    fc.constantFrom(0, -1, 1e-9, 1e9, 0.5, 60, 75, 90, "1/0 AWG", "dc-output", "ac-output", "micro", "supply-side", "S1", "inv-1", null),
  );

  it("whatever one field holds", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.constantFrom(...paths), extreme), { minLength: 1, maxLength: 4 }), (edits) => {
        const doc = structuredClone(base) as DesignDocumentInput & Record<string, unknown>;
        for (const [path, value] of edits) {
          const parent = path.slice(0, -1).reduce<any>((o, k) => o[k], doc);
          parent[path[path.length - 1]!] = value;
        }
        const out = reviewDocument(doc);
        if (out.ok) expect(Number.isFinite(out.review.ratings.dcKw)).toBe(true);
        else expect(out.problems.length).toBeGreaterThan(0);
      }),
      { numRuns: 1500 },
    );
  });
});

describe("keys named like Object's own properties", () => {
  // Defect: a document with a key such as "constructor" crashed the problem collector (a 500 from the API).
  test.each(["constructor", "__proto__", "toString", "hasOwnProperty", "valueOf"])(
    "%s is named as an unknown field, not a crash",
    (key) => {
      const body = JSON.parse(`{"${key}": 1, "codeEdition": "2020"}`);
      let thrown: unknown;
      try {
        reviewDocumentOrThrow(body);
      } catch (error) {
        thrown = error;
      }
      expect(thrown).toBeInstanceOf(AppError);
      const fieldErrors = (thrown as AppError).fieldErrors!;
      expect(Object.prototype.hasOwnProperty.call(fieldErrors, key)).toBe(true);
      expect(fieldErrors[key]).toEqual(["Unknown field; check its spelling against the document format"]);
      expect(JSON.parse(JSON.stringify(fieldErrors))[key]).toBeDefined();
    },
  );
});

describe("reviewDocument: where the connection lands", () => {
  it("a connection on a feeder answers with the feeder rule and no busbar breaker limit", () => {
    const doc = exampleDocument();
    doc.service = { ...doc.service, loadSideAt: "feeder", feeder: { ampacityA: 250, ocpdA: 200 } };
    const r = review(doc);
    // 200 A device + 1.25 × 32 A = 240 A ≤ 250 A (705.12(B)(1), 2020; from memory)
    expect(r.pointOfConnection).toEqual({ method: "load-side", rule: "feeder", maxPvBreakerA: null, status: "pass" });
    expect(check(r, "feeder-connection")).toMatchObject({ status: "pass", value: 250, limit: 240, codeRef: "NEC 2020 705.12(B)(1)" });
  });
});
