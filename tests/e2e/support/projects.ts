import { expect, type APIRequestContext } from "@playwright/test";

type DesignDraft = Record<string, unknown> & { array: { strings: Record<string, unknown>[] } };

/**
 * A new project of the viewer's company beside a demo project (same AHJ, utility and service) carrying
 * that project's design draft, changed by `edit`: a test can then change it without touching the demo data.
 */
export async function copyProjectWithDesign(
  api: APIRequestContext,
  {
    sourceId,
    customerName,
    street,
    edit = (d) => d,
  }: { sourceId: string; customerName: string; street: string; edit?: (draft: DesignDraft) => DesignDraft },
) {
  const source = await (await api.get(`/api/v1/projects/${sourceId}`)).json();
  const { draft } = (await (await api.get(`/api/v1/projects/${sourceId}/design`)).json()) as { draft: DesignDraft };
  const created = await api.post("/api/v1/projects", {
    data: {
      customerName,
      customerEmail: "",
      customerPhone: "",
      street,
      city: source.city,
      state: source.state,
      postalCode: source.postalCode,
      jurisdictionId: source.jurisdiction.id,
      utilityId: source.utility.id,
      utilityAccountNumber: "",
      meterNumber: "",
      mainBreakerA: source.mainBreakerA,
      busbarA: source.busbarA,
      serviceVoltageV: source.serviceVoltageV,
      servicePhases: source.servicePhases,
    },
  });
  expect(created.status()).toBe(201);
  const { id } = (await created.json()) as { id: string };
  expect((await api.put(`/api/v1/projects/${id}/design`, { data: edit(draft) })).status()).toBe(200);
  return { id };
}
