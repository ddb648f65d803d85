import { readFileSync } from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as designReview } from "@/app/api/v1/design-review/route";
import { createApiToken } from "@/lib/server/data/api-tokens";
import { closeDb } from "../support/db";
import { makeOrganization } from "../support/fixtures";

// The README's storage example, posted as an integration would post it (an API token, no session), must
// answer what the README shows. Clauses: NFPA 70 2017/2020/2023 Article 706 (ESS disconnect), 705.13 (power
// control systems, new in the 2020 edition), 710.15 (stand-alone supply).
const readme = readFileSync(path.join(process.cwd(), "README.md"), "utf8");
const section = readme.slice(readme.indexOf("### Storage in the design document"));
const requestText = section.slice(section.indexOf("-d '") + 4, section.indexOf("}'") + 1);
const answer = section.slice(section.indexOf("```json"), section.indexOf("```", section.indexOf("```json") + 7));
const quotedStorage = JSON.parse(/"storage": (\{[\s\S]*?\} \}),\n/.exec(answer)![1]!) as unknown;

let token: string;

beforeAll(async () => {
  const org = await makeOrganization("Storage API");
  token = (await createApiToken({ viewer: org.viewers.admin, input: { name: "Quote tool" } })).token;
});

afterAll(async () => {
  await closeDb();
});

async function post(body: string) {
  const response = await designReview(
    new NextRequest("http://127.0.0.1/api/v1/design-review", {
      method: "POST",
      body,
      headers: { authorization: `Bearer ${token}`, "content-type": "application/json" },
    }),
    { params: Promise.resolve({}) },
  );
  return { status: response.status, body: (await response.json()) as Record<string, never> };
}

type Check = { id: string; codeRef: string; status: string };

describe("POST /api/v1/design-review with the README's storage example", () => {
  it("answers the storage summary the README shows, every check passing", async () => {
    const { status, body } = await post(requestText);
    expect(status).toBe(200);
    expect(body.status).toBe("pass");
    expect(body.storage).toEqual(quotedStorage);
    expect(body.storage).toMatchObject({ totalUsableKwh: 25.6, maxDischargeKw: 7.6, pointOfConnectionA: 24 });
  });

  it.each([
    ["2017", false],
    ["2020", true],
    ["2023", true],
  ])("cites Article 706 in NEC %s, and 705.13 where the edition has it (%s)", async (edition, has70513) => {
    const doc = JSON.parse(requestText) as { codeEdition: string };
    const { status, body } = await post(JSON.stringify({ ...doc, codeEdition: edition }));
    expect(status).toBe(200);
    const checks = body.checks as Check[];
    const disconnect = checks.find((c) => c.id === "ess-disconnect")!;
    expect(disconnect.codeRef).toMatch(new RegExp(`^NEC ${edition} 706\\.`));
    expect(checks.some((c) => c.codeRef.includes("710.15"))).toBe(true);
    const poc = checks.find((c) => c.id === "point-of-connection")!;
    expect(poc.codeRef.includes("705.13")).toBe(has70513);
    // 2017 has no power control systems: the inverter's 32 A output is counted instead of the 24 A setting.
    expect((body.storage as { pointOfConnectionA: number }).pointOfConnectionA).toBe(has70513 ? 24 : 32);
  });

  it("names a DC-coupled battery's missing multimode inverter by its JSON path", async () => {
    const doc = JSON.parse(requestText) as { storage: Record<string, unknown> };
    const { status, body } = await post(JSON.stringify({ ...doc, storage: { ...doc.storage, multimodeInverterId: "inv-9" } }));
    expect(status).toBe(422);
    expect((body.error as { fieldErrors: Record<string, string[]> }).fieldErrors["storage.multimodeInverterId"]).toEqual([
      'No inverter with id "inv-9" is in inverters',
    ]);
  });
});
