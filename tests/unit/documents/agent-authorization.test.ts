// The agent authorization letter: it names the owner, the site and the agent from the project and the
// company's settings, carries a signature block for each owner, and keeps its cautions.
import { writeFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { agentAuthorizationFacts } from "@/lib/documents/agent-authorization/facts";
import type { AgentAuthorizationInput } from "@/lib/documents/agent-authorization/input";
import { renderAgentAuthorizationPdf } from "@/lib/documents/agent-authorization/render";
import { findSignatureBlocks } from "@/lib/documents/signing/blocks";
import { pageTexts } from "./read-pdf";

const input = (over: Partial<AgentAuthorizationInput> = {}): AgentAuthorizationInput => ({
  generatedAt: "2026-12-05T17:00:00.000Z",
  organization: { name: "Fixture Solar Co.", licenseNumber: "C10-000123", phone: "555-0142", timeZone: "America/Denver" },
  project: {
    number: 1042,
    customerName: "Imogen Farrow-Lake",
    address: "12 Tamarack Way, Fenwick Hollow, CO 80999",
    jurisdictionName: "Fenwick Hollow Building Division",
    utilityName: "Brindle Valley Power",
    utilityAccountNumber: "BV-448-2210",
  },
  secondOwnerName: null,
  ...over,
});

describe("agent authorization letter", () => {
  test("prints the owner, the site, the agent with its license and the authorities from the project", async () => {
    const bytes = await renderAgentAuthorizationPdf(input());
    if (process.env.KEEP_PDF) writeFileSync(process.env.KEEP_PDF, bytes);
    const text = (await pageTexts(bytes)).join(" ");
    for (const expected of [
      "Authorization of agent",
      "Imogen Farrow-Lake",
      "12 Tamarack Way, Fenwick Hollow, CO 80999",
      "Fixture Solar Co., contractor license C10-000123",
      "Brindle Valley Power · BV-448-2210",
      "Fenwick Hollow Building Division",
      "BEFORE YOU SIGN",
    ])
      expect(text).toContain(expected);
  });

  test.each([
    { secondOwnerName: null, roles: ["customer"] },
    { secondOwnerName: "Oskar Farrow-Lake", roles: ["customer", "secondOwner"] },
  ])("has a signature block for each owner (second owner: $secondOwnerName)", async ({ secondOwnerName, roles }) => {
    const bytes = await renderAgentAuthorizationPdf(input({ secondOwnerName }));
    if (process.env.KEEP_PDF && secondOwnerName) writeFileSync(process.env.KEEP_PDF.replace(".pdf", "-two.pdf"), bytes);
    const blocks = await findSignatureBlocks(bytes);
    expect(Object.keys(blocks).sort()).toEqual([...roles].sort());
    // One page, however many owners sign.
    expect((await pageTexts(bytes)).length).toBe(1);
    for (const box of Object.values(blocks)) expect(box!.width).toBeGreaterThan(100);
  });

  test("a missing license or utility prints as not set rather than an empty line", () => {
    const facts = agentAuthorizationFacts(
      input({ organization: { ...input().organization, licenseNumber: null }, project: { ...input().project, utilityName: null } }),
    );
    expect(facts.agent[0]!.value).toBe("Fixture Solar Co.");
    expect(facts.owner.find((f) => f.label.startsWith("Utility"))!.value).toBe("Not set · BV-448-2210");
    expect(facts.grants.join(" ")).toContain("with the electric utility");
  });
});
