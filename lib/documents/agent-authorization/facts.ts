import { longDate } from "../text";
import type { AgentAuthorizationInput } from "./input";

// Every sentence the agent authorization letter prints, worked out here so the layout only places them
// and the tests read the same strings. The wording is ours; the cautions send the reader to the
// authority's and the utility's own forms where they have one.

export type AgentAuthorizationFacts = {
  title: string;
  subtitle: string;
  dated: string;
  owner: { label: string; value: string }[];
  agent: { label: string; value: string }[];
  grants: string[];
  limits: string[];
  cautions: string[];
  ownerBlock: { title: string; printedName: string };
  secondOwnerBlock: { title: string; printedName: string } | null;
};

const orNotSet = (value: string | null) => value || "Not set";

export function agentAuthorizationFacts(input: AgentAuthorizationInput): AgentAuthorizationFacts {
  const { organization: org, project: p } = input;
  const agent = `${org.name}${org.licenseNumber ? `, contractor license ${org.licenseNumber}` : ""}`;
  const utility = p.utilityName ?? "the electric utility";
  const authority = p.jurisdictionName ?? "the authority having jurisdiction (AHJ)";
  const owners = input.secondOwnerName ? `${p.customerName} and ${input.secondOwnerName}` : p.customerName;
  return {
    title: "Authorization of agent",
    subtitle: `Grid-tied PV system · Project ${p.number}`,
    dated: `Prepared ${longDate(input.generatedAt, org.timeZone)}`,
    owner: [
      { label: input.secondOwnerName ? "Owners" : "Owner", value: owners },
      { label: "Site address", value: p.address },
      { label: "Utility and account number", value: `${orNotSet(p.utilityName)} · ${orNotSet(p.utilityAccountNumber)}` },
      { label: "Authority having jurisdiction", value: orNotSet(p.jurisdictionName) },
    ],
    agent: [
      { label: "Agent", value: agent },
      { label: "Phone", value: orNotSet(org.phone) },
    ],
    grants: [
      `to apply for the building and electrical permits of the photovoltaic (PV) system at the site above with ${authority}, answer its plan review and arrange its inspections;`,
      `to file the interconnection application for the system with ${utility}, answer its questions and arrange its meter work and any witness test;`,
      "to receive, on my behalf, the letters, permits and approvals these authorities send about this system.",
    ],
    limits: [
      "This authorization covers this site and this system only. It ends when the utility grants permission to operate (PTO), or sooner if I withdraw it in writing.",
      "I stay the owner of the property, the system and the electric account. The agent may not change my rate plan, sign a contract or take on a debt in my name.",
    ],
    cautions: [
      "Some authorities and utilities require their own authorization form, a notarized signature, or the account holder's signature on the application itself. Where they do, this letter does not replace it.",
      "The work this letter covers is done under the electrical code adopted by the authority having jurisdiction and by licensed persons; this letter changes neither.",
    ],
    ownerBlock: { title: "Owner", printedName: p.customerName },
    secondOwnerBlock: input.secondOwnerName ? { title: "Second owner", printedName: input.secondOwnerName } : null,
  };
}
