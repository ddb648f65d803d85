import type { Targets } from "./targets";

// Who may use each route handler, server action and page of the app, and how to call it against the
// first company's targets. The authorization matrix tries everyone else; the malformed-input test
// sends hostile bodies to the same ways in as someone who may use them.

export type Persona = "admin" | "anonymous" | "forgedCookie" | "installer" | "coordinator" | "rivalCoordinator" | "rivalAdmin" | "token";
export type Role = "admin" | "coordinator" | "installer";
/** project: one of this company's projects; item: another record of this company; org: the caller's own organization, no id. */
export type Scope = "project" | "item" | "org";

export type Entry = {
  scope: Scope;
  /** Roles of the company that may do it (installers only on their assigned projects). */
  roles: Role[];
  /** For routes and pages: the address; for actions: the page it is posted to and its arguments. */
  url?: (t: Targets) => string;
  body?: (t: Targets) => unknown;
  page?: (t: Targets) => string;
  args?: (t: Targets) => unknown[];
  /** A multipart upload with one file of this name and type (and the kind field, for field uploads). */
  upload?: { name: string; mimeType: string; kind?: string };
  /** A POST that only reads (API tokens may call it). */
  readsOnly?: boolean;
  /** The way in is public by design; the reason says where its own check is tested. */
  exempt?: string;
};

export const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082",
  "hex",
);
export const PDF = Buffer.from(
  "%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj 2 0 obj<</Type/Pages/Kids[]/Count 0>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n",
);

export const ALL: Role[] = ["admin", "coordinator", "installer"];
export const OFFICE: Role[] = ["admin", "coordinator"];
export const ADMIN: Role[] = ["admin"];
const project = (t: Targets) => `/api/v1/projects/${t.projectId}`;

export const ROUTES: Record<string, Entry> = {
  "GET /api/auth/:nextauth*": { scope: "org", roles: ALL, exempt: "next-auth's own sign-in endpoints (tests/e2e/auth)" },
  "POST /api/auth/:nextauth*": {
    scope: "org",
    roles: ALL,
    exempt: "next-auth's own sign-in endpoints, CSRF-token checked (tests/e2e/auth)",
  },
  "GET /api/health": { scope: "org", roles: ALL, exempt: "health reports service status only (tests/e2e/api/bad-input)" },
  "POST /api/webhooks/stripe": {
    scope: "org",
    roles: ALL,
    exempt: "authenticated by the processor's signature (tests/integration/server/data/payments)",
  },
  "GET /share/:token/gone": {
    scope: "org",
    roles: ALL,
    exempt: "the link's token is the credential (tests/integration/server/data/share-links)",
  },
  "GET /share/:token/packets/:packetId": {
    scope: "org",
    roles: ALL,
    exempt: "the link's token is the credential (tests/integration/server/data/share-links)",
  },
  "GET /sign/:token/gone": {
    scope: "org",
    roles: ALL,
    exempt: "the signing link's token is the credential (tests/integration/server/use-cases/signatures)",
  },
  "GET /sign/:token/pages/:pageNumber": {
    scope: "org",
    roles: ALL,
    exempt: "the signing link's token is the credential (tests/integration/server/use-cases/signatures)",
  },
  "GET /sign/:token/document": {
    scope: "org",
    roles: ALL,
    exempt: "the signing link's token is the credential (tests/integration/server/use-cases/signatures)",
  },
  "GET /api/v1/signature-requests/:requestId/:file": {
    scope: "project",
    roles: ALL,
    url: (t) => `/api/v1/signature-requests/${t.signatureRequestId}/original`,
  },
  "GET /calendar/:token": {
    scope: "org",
    roles: ALL,
    exempt: "the feed's token is the credential (tests/integration/server/data/calendar-feeds)",
  },
  "GET /api/v1/inspections/:inspectionId/calendar-event": {
    scope: "project",
    roles: ALL,
    url: (t) => `/api/v1/inspections/${t.inspectionId}/calendar-event`,
  },
  "GET /api/v1/projects": { scope: "org", roles: ALL, url: () => "/api/v1/projects?pageSize=100" },
  "POST /api/v1/projects": {
    scope: "org",
    roles: OFFICE,
    url: () => "/api/v1/projects",
    body: (t) => ({ ...t.bodies.project, customerName: `Should not exist ${t.stamp}` }),
  },
  "GET /api/v1/projects/:projectId": { scope: "project", roles: ALL, url: project },
  "GET /api/v1/reports/cycle-times": { scope: "org", roles: OFFICE, url: () => "/api/v1/reports/cycle-times?groupBy=utility" },
  "GET /api/v1/reports/filings": { scope: "org", roles: OFFICE, url: () => "/api/v1/reports/filings?from=2020-01-01&to=2030-12-31" },
  "GET /api/v1/reports/payments": { scope: "org", roles: OFFICE, url: () => "/api/v1/reports/payments?from=2020-01-01&to=2030-12-31" },
  "PUT /api/v1/projects/:projectId": {
    scope: "project",
    roles: OFFICE,
    url: project,
    body: (t) => ({ ...t.bodies.project, customerName: "Taken over" }),
  },
  "POST /api/v1/projects/:projectId/stage": {
    scope: "project",
    roles: OFFICE,
    url: (t) => `${project(t)}/stage`,
    body: () => ({ toStage: "closed", note: "not yours" }),
  },
  "GET /api/v1/projects/:projectId/filings": { scope: "project", roles: ALL, url: (t) => `${project(t)}/filings` },
  "GET /api/v1/projects/:projectId/design": { scope: "project", roles: ALL, url: (t) => `${project(t)}/design` },
  "PUT /api/v1/projects/:projectId/design": {
    scope: "project",
    roles: OFFICE,
    url: (t) => `${project(t)}/design`,
    body: (t) => t.bodies.draft,
  },
  "GET /api/v1/projects/:projectId/design-document": { scope: "project", roles: ALL, url: (t) => `${project(t)}/design-document` },
  "GET /api/v1/projects/:projectId/review": { scope: "project", roles: ALL, url: (t) => `${project(t)}/review` },
  "GET /api/v1/projects/:projectId/packets": { scope: "project", roles: ALL, url: (t) => `${project(t)}/packets` },
  "POST /api/v1/projects/:projectId/packets": {
    scope: "project",
    roles: OFFICE,
    url: (t) => `${project(t)}/packets`,
    body: () => ({ kind: "interconnection" }),
  },
  "GET /api/v1/projects/:projectId/files": { scope: "project", roles: ALL, url: (t) => `${project(t)}/files` },
  "POST /api/v1/projects/:projectId/files": {
    scope: "project",
    roles: ALL,
    url: (t) => `${project(t)}/files`,
    upload: { name: "intruder.png", mimeType: "image/png", kind: "site-photo" },
  },
  "GET /api/v1/projects/:projectId/files/:fileId": { scope: "project", roles: ALL, url: (t) => `${project(t)}/files/${t.fileId}` },
  // The uploader, or the project's coordinator or an admin (tests/integration/server/data/project-files); tried here by everyone outside the project.
  "DELETE /api/v1/projects/:projectId/files/:fileId": { scope: "project", roles: ALL, url: (t) => `${project(t)}/files/${t.fileId}` },
  "GET /api/v1/projects/:projectId/commissioning/:document": {
    scope: "project",
    roles: ALL,
    url: (t) => `${project(t)}/commissioning/certificate`,
  },
  "GET /api/v1/packets/:packetId/file": { scope: "project", roles: ALL, url: (t) => `/api/v1/packets/${t.packetId}/file` },
  "POST /api/v1/packets/:packetId/retry": { scope: "project", roles: OFFICE, url: (t) => `/api/v1/packets/${t.packetId}/retry` },
  "GET /api/v1/payments/:paymentId/receipt": { scope: "project", roles: OFFICE, url: (t) => `/api/v1/payments/${t.paymentId}/receipt` },
  "POST /api/v1/design-review": { scope: "org", roles: ALL, url: () => "/api/v1/design-review", body: () => ({}), readsOnly: true },
  "GET /api/v1/equipment": { scope: "org", roles: OFFICE, url: () => "/api/v1/equipment" },
  "POST /api/v1/equipment": {
    scope: "org",
    roles: ADMIN,
    url: () => "/api/v1/equipment",
    body: (t) => ({ ...t.bodies.equipment, model: `Should not exist ${t.stamp}` }),
  },
  "GET /api/v1/equipment/:equipmentId": { scope: "item", roles: OFFICE, url: (t) => `/api/v1/equipment/${t.equipmentId}` },
  "PUT /api/v1/equipment/:equipmentId": {
    scope: "item",
    roles: ADMIN,
    url: (t) => `/api/v1/equipment/${t.equipmentId}`,
    body: (t) => ({ ...t.bodies.equipment, model: "Taken over" }),
  },
  "PUT /api/v1/equipment/:equipmentId/archive": {
    scope: "item",
    roles: ADMIN,
    url: (t) => `/api/v1/equipment/${t.equipmentId}/archive`,
    body: () => ({ isArchived: true }),
  },
  "GET /api/v1/equipment/:equipmentId/datasheet": {
    scope: "item",
    roles: OFFICE,
    url: (t) => `/api/v1/equipment/${t.equipmentId}/datasheet`,
  },
  "POST /api/v1/equipment/:equipmentId/datasheet": {
    scope: "item",
    roles: ADMIN,
    url: (t) => `/api/v1/equipment/${t.equipmentId}/datasheet`,
    upload: { name: "intruder.pdf", mimeType: "application/pdf" },
  },
};

const A = "app/(app)";
const IMPORT_CSV = (t: Targets) => `Customer,Street,City,State,ZIP\r\nShould not exist ${t.stamp},1 Nowhere Rd,Fernwick,CO,80301\r\n`;
// The first five columns feed the required fields; the rest stay blank.
const IMPORT_MAPPING = {
  customerName: 0,
  street: 1,
  city: 2,
  state: 3,
  postalCode: 4,
  ...Object.fromEntries(
    [
      "customerEmail",
      "customerPhone",
      "jurisdiction",
      "utility",
      "utilityAccountNumber",
      "meterNumber",
      "mainBreakerA",
      "busbarA",
      "serviceVoltageV",
      "servicePhases",
      "coordinator",
      "installer",
    ].map((k) => [k, null]),
  ),
};
export const ACTIONS: Record<string, Entry> = {
  [`${A}/projects/import/actions.ts#previewProjectImportAction`]: {
    scope: "org",
    roles: OFFICE,
    page: () => "/projects/import",
    args: (t) => [{ csv: IMPORT_CSV(t), mapping: IMPORT_MAPPING }],
  },
  [`${A}/projects/import/actions.ts#importProjectsAction`]: {
    scope: "org",
    roles: OFFICE,
    page: () => "/projects/import",
    args: (t) => [{ csv: IMPORT_CSV(t), mapping: IMPORT_MAPPING }],
  },
  [`${A}/projects/actions.ts#createProjectAction`]: {
    scope: "org",
    roles: OFFICE,
    page: () => "/projects/new",
    args: (t) => [{ ...t.bodies.project, customerName: `Should not exist ${t.stamp}` }],
  },
  [`${A}/projects/actions.ts#updateProjectAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/edit`,
    args: (t) => [{ projectId: t.projectId, values: { ...t.bodies.project, customerName: "Taken over" } }],
  },
  [`${A}/projects/actions.ts#setHoldAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}`,
    args: (t) => [{ projectId: t.projectId, hold: "cancelled", reason: "not yours" }],
  },
  [`${A}/projects/actions.ts#changeStageAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}`,
    args: (t) => [{ projectId: t.projectId, toStage: "closed", note: "not yours" }],
  },
  [`${A}/projects/[projectId]/design/actions.ts#saveDesignAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/design`,
    args: (t) => [{ projectId: t.projectId, draft: t.bodies.draft }],
  },
  [`${A}/projects/[projectId]/documents/actions.ts#requestPacketAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/documents`,
    args: (t) => [{ projectId: t.projectId, kind: "interconnection" }],
  },
  [`${A}/projects/[projectId]/documents/actions.ts#retryPacketAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/documents`,
    args: (t) => [{ packetId: t.packetId }],
  },
  [`${A}/projects/[projectId]/documents/share-actions.ts#createShareLinkAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/documents`,
    args: (t) => [{ projectId: t.projectId, packetIds: [t.packetId], note: "stolen" }],
  },
  [`${A}/projects/[projectId]/documents/share-actions.ts#revokeShareLinkAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/documents`,
    args: (t) => [{ shareLinkId: t.shareLinkId }],
  },
  [`${A}/projects/[projectId]/documents/signature-actions.ts#requestSignaturesAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/documents`,
    args: (t) => [
      {
        projectId: t.projectId,
        request: { document: "agent-authorization", signers: [{ role: "customer", name: "Stolen Name", email: "stolen@mail.example" }] },
      },
    ],
  },
  [`${A}/projects/[projectId]/documents/signature-actions.ts#remindSignerAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/documents`,
    args: (t) => [{ signerId: t.signerId }],
  },
  [`${A}/projects/[projectId]/documents/signature-actions.ts#revokeSignerAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/documents`,
    args: (t) => [{ signerId: t.signerId }],
  },
  [`${A}/projects/[projectId]/field/signing-actions.ts#signCertificateInPersonAction`]: {
    scope: "project",
    roles: ALL,
    page: (t) => `/projects/${t.projectId}/field`,
    args: (t) => [
      {
        projectId: t.projectId,
        installer: { name: "Stolen Crew", agreed: true, mark: { kind: "typed", name: "Stolen Crew" } },
        customer: { name: "Stolen Owner", agreed: true, mark: { kind: "typed", name: "Stolen Owner" } },
      },
    ],
  },
  [`${A}/projects/[projectId]/fees/actions.ts#payFeesAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/fees`,
    args: (t) => [{ projectId: t.projectId, feeKeys: ["permit"] }],
  },
  [`${A}/projects/[projectId]/fees/actions.ts#refundPaymentAction`]: {
    scope: "project",
    roles: ADMIN,
    page: (t) => `/projects/${t.projectId}/fees`,
    args: (t) => [{ paymentId: t.paymentId, amount: "1.00", reason: "not yours" }],
  },
  [`${A}/projects/[projectId]/fees/actions.ts#setValuationAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/fees`,
    args: (t) => [{ projectId: t.projectId, valuation: "1000" }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#changeFilingStatusAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ filingId: t.filingId, status: "withdrawn", sentTo: "", note: "not yours" }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#updateFilingDetailsAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ filingId: t.filingId, referenceNumber: "TAKEN-1", waitingOnCustomer: false, notes: "not yours" }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#recordRoundAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ filingId: t.filingId, receivedOn: "2026-03-10", items: [{ text: "not yours", reference: "" }] }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#addFilingAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ projectId: t.projectId, title: "not yours", authority: "other", authorityName: "Not yours" }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#attachLetterAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ roundId: t.filingId, letterFileId: t.filingId }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#answerItemAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ itemId: t.filingId, response: "not yours" }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#scheduleInspectionAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ filingId: t.filingId, kind: "final", scheduledFor: "2026-04-02" }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#recordInspectionResultAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ inspectionId: t.filingId, result: "passed", resultOn: "2026-04-02" }],
  },
  [`${A}/projects/[projectId]/filings/actions.ts#recordPtoAction`]: {
    scope: "project",
    roles: OFFICE,
    page: (t) => `/projects/${t.projectId}/filings`,
    args: (t) => [{ filingId: t.filingId, ptoOn: "2026-04-22" }],
  },
  [`${A}/projects/[projectId]/field/actions.ts#saveCommissioningAction`]: {
    scope: "project",
    roles: ALL,
    page: (t) => `/projects/${t.projectId}/field`,
    args: (t) => [{ projectId: t.projectId, readings: {} }],
  },
  [`${A}/profile/actions.ts#setDailyDigestAction`]: { scope: "org", roles: ALL, page: () => "/profile", args: () => [{ enabled: false }] },
  [`${A}/profile/actions.ts#createCalendarFeedAction`]: { scope: "org", roles: ALL, page: () => "/profile", args: () => [{}] },
  [`${A}/profile/actions.ts#revokeCalendarFeedAction`]: { scope: "org", roles: ALL, page: () => "/profile", args: () => [{}] },
  [`${A}/settings/api-tokens/actions.ts#createApiTokenAction`]: {
    scope: "org",
    roles: ADMIN,
    page: () => "/settings/api-tokens",
    args: () => [{ name: "stolen" }],
  },
  [`${A}/settings/api-tokens/actions.ts#revokeApiTokenAction`]: {
    scope: "item",
    roles: ADMIN,
    page: () => "/settings/api-tokens",
    args: (t) => [{ apiTokenId: t.apiTokenId }],
  },
  [`${A}/settings/equipment/actions.ts#createEquipmentAction`]: {
    scope: "org",
    roles: ADMIN,
    page: () => "/settings/equipment/new",
    args: (t) => [{ ...t.bodies.equipment, model: `Should not exist ${t.stamp}` }],
  },
  [`${A}/settings/equipment/actions.ts#updateEquipmentAction`]: {
    scope: "item",
    roles: ADMIN,
    page: (t) => `/settings/equipment/${t.equipmentId}`,
    args: (t) => [{ equipmentId: t.equipmentId, ...t.bodies.equipment, model: "Taken over" }],
  },
  [`${A}/settings/equipment/actions.ts#setEquipmentArchivedAction`]: {
    scope: "item",
    roles: ADMIN,
    page: () => "/settings/equipment",
    args: (t) => [{ equipmentId: t.equipmentId, isArchived: true }],
  },
  [`${A}/settings/fee-schedule-actions.ts#saveFeeScheduleAction`]: {
    scope: "item",
    roles: ADMIN,
    page: (t) => `/settings/jurisdictions/${t.jurisdictionId}`,
    args: (t) => [{ authorityKind: "jurisdiction", authorityId: t.jurisdictionId, lines: [] }],
  },
  [`${A}/settings/authority-actions.ts#saveAuthorityAction`]: {
    scope: "item",
    roles: ADMIN,
    page: (t) => `/settings/jurisdictions/${t.jurisdictionId}`,
    args: (t) => [{ kind: "jurisdiction", authorityId: t.jurisdictionId, values: { ...t.bodies.jurisdiction, name: "Taken over" } }],
  },
  [`${A}/settings/organization/actions.ts#updateOrganizationAction`]: {
    scope: "org",
    roles: ADMIN,
    page: () => "/settings/organization",
    args: () => [{ name: "Taken over", licenseNumber: "", phone: "", timeZone: "America/Denver" }],
  },
  [`${A}/settings/users/actions.ts#inviteUserAction`]: {
    scope: "org",
    roles: ADMIN,
    page: () => "/settings/users",
    args: (t) => [{ name: "Intruder", email: `intruder.${t.stamp}@mail.example`, role: "admin" }],
  },
  [`${A}/settings/users/actions.ts#changeRoleAction`]: {
    scope: "item",
    roles: ADMIN,
    page: () => "/settings/users",
    args: (t) => [{ userId: t.userId, role: "admin" }],
  },
  [`${A}/settings/users/actions.ts#setActiveAction`]: {
    scope: "item",
    roles: ADMIN,
    page: () => "/settings/users",
    args: (t) => [{ userId: t.userId, isActive: false }],
  },
  [`${A}/settings/users/actions.ts#renewInvitationAction`]: {
    scope: "item",
    roles: ADMIN,
    page: () => "/settings/users",
    args: (t) => [{ userId: t.userId }],
  },
  ["app/(sign)/sign/[token]/actions.ts#signDocumentAction"]: {
    scope: "org",
    roles: ALL,
    exempt: "the signing link's token is the credential (tests/integration/server/use-cases/signatures)",
  },
  ["app/(sign)/sign/[token]/actions.ts#declineSigningAction"]: {
    scope: "org",
    roles: ALL,
    exempt: "the signing link's token is the credential (tests/integration/server/use-cases/signatures)",
  },
  ["app/(auth)/invitation/[token]/actions.ts#acceptInvitationAction"]: {
    scope: "org",
    roles: ALL,
    exempt: "the invitation token is the credential (tests/integration/server/data/users)",
  },
};

export const PAGES: Record<string, Entry> = {
  "/": { scope: "org", roles: ALL, exempt: "redirects to the dashboard" },
  "/sign-in": { scope: "org", roles: ALL, exempt: "public sign-in" },
  "/sign-out": { scope: "org", roles: ALL, exempt: "public sign-out confirmation" },
  "/invitation/:token": { scope: "org", roles: ALL, exempt: "the invitation token is the credential" },
  "/share/:token": { scope: "org", roles: ALL, exempt: "the link's token is the credential" },
  "/sign/:token": { scope: "org", roles: ALL, exempt: "the signing link's token is the credential" },
  "/dashboard": { scope: "org", roles: ALL, url: () => "/dashboard" },
  "/mailbox": { scope: "org", roles: ADMIN, url: () => "/mailbox" },
  "/profile": { scope: "org", roles: ALL, url: () => "/profile" },
  "/projects/new": { scope: "org", roles: OFFICE, url: () => "/projects/new" },
  "/projects/import": { scope: "org", roles: OFFICE, url: () => "/projects/import" },
  "/reports": { scope: "org", roles: OFFICE, url: () => "/reports" },
  "/projects/:projectId": { scope: "project", roles: ALL, url: (t) => `/projects/${t.projectId}` },
  "/projects/:projectId/design": { scope: "project", roles: ALL, url: (t) => `/projects/${t.projectId}/design` },
  "/projects/:projectId/documents": { scope: "project", roles: ALL, url: (t) => `/projects/${t.projectId}/documents` },
  "/projects/:projectId/edit": { scope: "project", roles: OFFICE, url: (t) => `/projects/${t.projectId}/edit` },
  "/projects/:projectId/fees": { scope: "project", roles: OFFICE, url: (t) => `/projects/${t.projectId}/fees` },
  "/projects/:projectId/filings": { scope: "project", roles: ALL, url: (t) => `/projects/${t.projectId}/filings` },
  "/projects/:projectId/field": { scope: "project", roles: ALL, url: (t) => `/projects/${t.projectId}/field` },
  "/settings": { scope: "org", roles: OFFICE, url: () => "/settings" },
  "/settings/api-tokens": { scope: "org", roles: ADMIN, url: () => "/settings/api-tokens" },
  "/settings/equipment": { scope: "org", roles: OFFICE, url: () => "/settings/equipment" },
  "/settings/equipment/new": { scope: "org", roles: ADMIN, url: () => "/settings/equipment/new" },
  "/settings/equipment/:equipmentId": { scope: "item", roles: ADMIN, url: (t) => `/settings/equipment/${t.equipmentId}` },
  "/settings/jurisdictions": { scope: "org", roles: OFFICE, url: () => "/settings/jurisdictions" },
  "/settings/jurisdictions/:jurisdictionId": { scope: "item", roles: ADMIN, url: (t) => `/settings/jurisdictions/${t.jurisdictionId}` },
  "/settings/organization": { scope: "org", roles: ADMIN, url: () => "/settings/organization" },
  "/settings/users": { scope: "org", roles: ADMIN, url: () => "/settings/users" },
  "/settings/utilities": { scope: "org", roles: OFFICE, url: () => "/settings/utilities" },
  "/settings/utilities/:utilityId": { scope: "item", roles: ADMIN, url: (t) => `/settings/utilities/${t.utilityId}` },
};
