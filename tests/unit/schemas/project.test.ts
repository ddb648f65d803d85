import { describe, expect, it } from "vitest";
import { ChangeStageInput, ProjectInput, ProjectListQuery } from "@/lib/schemas/project";

const base = { customerName: "Wren Alderley", street: "44 Cinder Lane", city: "Testville", state: "co", postalCode: "80001" };
const messages = (result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((result.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));

describe("ProjectInput", () => {
  it("turns empty form fields into nulls and numeric strings into numbers", () => {
    const out = ProjectInput.parse({
      ...base,
      customerEmail: "",
      customerPhone: "",
      jurisdictionId: "",
      mainBreakerA: "200",
      busbarA: "225",
      serviceVoltageV: "240",
      servicePhases: "1",
    });
    expect(out).toMatchObject({
      state: "CO",
      customerEmail: null,
      customerPhone: null,
      jurisdictionId: null,
      mainBreakerA: 200,
      busbarA: 225,
      serviceVoltageV: 240,
      servicePhases: 1,
    });
  });

  it.each([[{ waitingOn: "inspector" }], [{ permitStatus: "lost" }], [{ sort: "waitingOn" }]])("refuses the filing filter %j", (query) => {
    expect(ProjectListQuery.safeParse(query).success).toBe(false);
  });

  it.each([
    [{ customerName: "" }, "customerName", "Enter the customer's name"],
    [{ customerName: "x".repeat(161) }, "customerName", "At most 160 characters"],
    [{ state: "Colorado" }, "state", "Use the two-letter state code"],
    [{ postalCode: "8000" }, "postalCode", "Use a 5-digit ZIP code"],
    [{ mainBreakerA: "two hundred" }, "mainBreakerA", "Main breaker must be a whole number of amperes between 1 and 4000"],
    [{ busbarA: -5 }, "busbarA", "Busbar rating must be a whole number of amperes between 1 and 4000"],
    [{ serviceVoltageV: "230" }, "serviceVoltageV", "Service voltage must be one of 120, 208, 240, 277, 480 V"],
    [{ servicePhases: "2" }, "servicePhases", "Phases must be 1 or 3"],
    [{ jurisdictionId: "not-an-id" }, "jurisdictionId", "Unknown choice"],
    [{ mainBreakerA: "225", busbarA: "200" }, "mainBreakerA", "The main breaker cannot be larger than the busbar rating"],
  ])("refuses %j with a readable message", (patch, path, message) => {
    expect(messages(ProjectInput.safeParse({ ...base, ...patch }))[path]).toBe(message);
  });

  it("refuses unknown fields", () => {
    expect(ProjectInput.safeParse({ ...base, organizationId: "someone-else" }).success).toBe(false);
  });
});

describe("ProjectListQuery", () => {
  it("fills defaults", () => {
    expect(ProjectListQuery.parse({})).toEqual({
      page: 1,
      pageSize: 20,
      sort: "number",
      direction: "desc",
      q: "",
      stage: "",
      waitingOn: "",
      permitStatus: "",
      interconnectionStatus: "",
      hold: "",
    });
  });

  it.each([
    [{ stage: "approved" }, "stage"],
    [{ pageSize: "1000" }, "pageSize"],
    [{ page: "zero" }, "page"],
    [{ sort: "password" }, "sort"],
    [{ q: "x".repeat(101) }, "q"],
  ])("refuses %j", (query, path) => {
    expect(Object.keys(messages(ProjectListQuery.safeParse(query)))).toContain(path);
  });
});

describe("ChangeStageInput", () => {
  it("names the valid stages when one is unknown", () => {
    const result = ChangeStageInput.safeParse({ projectId: "6f1c1a3e-8d0e-4b7a-9a53-2f0d7f7c1b11", toStage: "approved" });
    expect(messages(result).toStage).toContain("permit_filed");
  });
});
