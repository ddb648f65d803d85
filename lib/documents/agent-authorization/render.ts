import { createElement } from "react";
import { AgentAuthorizationLetter } from "@/templates/pdf/agent-authorization/agent-authorization-letter";
import { renderPdf } from "../render";
import { printableDeep } from "../text";
import { agentAuthorizationFacts } from "./facts";
import type { AgentAuthorizationInput } from "./input";

/** Renders the agent authorization letter to PDF bytes, with a signature block for each owner. */
export async function renderAgentAuthorizationPdf(input: AgentAuthorizationInput): Promise<Uint8Array> {
  // Names and addresses are typed by people: characters the fonts cannot draw are spelled out.
  return renderPdf(createElement(AgentAuthorizationLetter, { facts: printableDeep(agentAuthorizationFacts(input)) }));
}
