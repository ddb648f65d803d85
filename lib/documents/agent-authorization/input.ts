// What the agent authorization letter prints, gathered from the project and the company's settings when
// the coordinator asks for it. Plain data: the facts and the layout take it from here.

export type AgentAuthorizationInput = {
  generatedAt: string; // ISO date-time
  organization: { name: string; licenseNumber: string | null; phone: string | null; timeZone: string };
  project: {
    number: number;
    customerName: string;
    address: string; // one line: street, city, state postal code
    jurisdictionName: string | null;
    utilityName: string | null;
    utilityAccountNumber: string | null;
  };
  /** A second owner named by the coordinator, printed under the owner; null when there is none. */
  secondOwnerName: string | null;
};
