import "server-only";
import type { Viewer } from "@/lib/domain/permissions";
import type { AgentAuthorizationInput } from "@/lib/documents/agent-authorization/input";
import { documentOrganization, getOrganization } from "./organizations";
import { getProjectById } from "./projects";

/** What the agent authorization letter prints: the project's owner and site, the company's name, license and phone. */
export async function buildAgentAuthorizationInput({
  viewer,
  projectId,
  secondOwnerName,
}: {
  viewer: Viewer;
  projectId: string;
  secondOwnerName: string | null;
}): Promise<AgentAuthorizationInput> {
  const [project, organization] = await Promise.all([getProjectById({ viewer, projectId }), getOrganization({ viewer })]);
  return {
    generatedAt: new Date().toISOString(),
    organization: documentOrganization(organization),
    project: {
      number: project.number,
      customerName: project.customerName,
      address: project.address,
      jurisdictionName: project.jurisdiction?.name ?? null,
      utilityName: project.utility?.name ?? null,
      utilityAccountNumber: project.utilityAccountNumber,
    },
    secondOwnerName,
  };
}
