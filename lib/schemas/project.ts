import { z } from "zod";
import { safeString, whenValid } from "./fields";
import { FILING_STATUSES, WAITING_PARTIES } from "@/lib/domain/filings";
import { STAGES } from "@/lib/domain/stages";

const text = (label: string, max: number) => safeString().trim().min(1, `Enter the ${label}`).max(max, `At most ${max} characters`);
const optionalText = (max: number) =>
  safeString()
    .trim()
    .max(max, `At most ${max} characters`)
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional()
    .transform((v) => v ?? null);
const optionalId = z
  .union([safeString().uuid("Unknown choice"), z.literal(""), z.null()])
  .optional()
  .transform((v) => (v ? v : null));
// Form fields arrive as strings; the API may send numbers. Empty means "not known yet".
const optionalAmps = (label: string) =>
  z
    .union([z.number(), safeString().trim()])
    .optional()
    .nullable()
    .transform((v, ctx) => {
      if (v === "" || v === null || v === undefined) return null;
      const n = typeof v === "number" ? v : Number(v);
      if (!Number.isInteger(n) || n < 1 || n > 4000) {
        ctx.addIssue({ code: "custom", message: `${label} must be a whole number of amperes between 1 and 4000` });
        return z.NEVER;
      }
      return n;
    });

export const SERVICE_VOLTAGES = [120, 208, 240, 277, 480] as const;

export const ProjectInput = z
  .object({
    customerName: text("customer's name", 160),
    customerEmail: z
      .union([safeString().trim().toLowerCase().email("Enter a valid e-mail address").max(254), z.literal("")])
      .optional()
      .transform((v) => v || null),
    customerPhone: optionalText(40),
    street: text("street address", 200),
    city: text("city", 100),
    state: safeString()
      .trim()
      .toUpperCase()
      .regex(/^[A-Z]{2}$/, "Use the two-letter state code"),
    postalCode: safeString()
      .trim()
      .regex(/^\d{5}(-\d{4})?$/, "Use a 5-digit ZIP code"),
    jurisdictionId: optionalId,
    utilityId: optionalId,
    utilityAccountNumber: optionalText(40),
    meterNumber: optionalText(40),
    mainBreakerA: optionalAmps("Main breaker"),
    busbarA: optionalAmps("Busbar rating"),
    serviceVoltageV: z
      .union([z.number(), safeString().trim()])
      .optional()
      .nullable()
      .transform((v, ctx) => {
        if (v === "" || v === null || v === undefined) return null;
        const n = Number(v);
        if (!(SERVICE_VOLTAGES as readonly number[]).includes(n)) {
          ctx.addIssue({ code: "custom", message: `Service voltage must be one of ${SERVICE_VOLTAGES.join(", ")} V` });
          return z.NEVER;
        }
        return n;
      }),
    servicePhases: z
      .union([z.literal(1), z.literal(3), z.literal("1"), z.literal("3"), z.literal(""), z.null()], { error: "Phases must be 1 or 3" })
      .optional()
      .transform((v) => (v === "" || v === null || v === undefined ? null : Number(v))),
    coordinatorId: optionalId,
    installerId: optionalId,
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.busbarA !== null && v.mainBreakerA !== null && v.mainBreakerA > v.busbarA) {
      ctx.addIssue({ code: "custom", path: ["mainBreakerA"], message: "The main breaker cannot be larger than the busbar rating" });
    }
  });
export type ProjectInput = z.input<typeof ProjectInput>;
export type ProjectValues = z.output<typeof ProjectInput>;

export const StageSchema = z.enum(STAGES, { error: `Unknown stage; use one of: ${STAGES.join(", ")}` });

export const ChangeStageInput = z.object({
  projectId: safeString().uuid("Unknown project"),
  toStage: StageSchema,
  note: safeString().trim().max(2000, "At most 2000 characters").default(""),
});
export type ChangeStageInput = z.input<typeof ChangeStageInput>;

/** Setting a project aside (on hold, or cancelled) and taking it back up; setting aside needs a reason. */
export const ProjectHoldInput = z
  .object({
    projectId: safeString().uuid("Unknown project"),
    hold: z.enum(["on_hold", "cancelled", "active"], { error: "Choose on hold, cancelled or active" }),
    reason: safeString().trim().max(2000, "At most 2000 characters").default(""),
  })
  .refine((v) => v.hold === "active" || v.reason.length > 0, {
    path: ["reason"],
    message: "Say why the project is set aside",
    when: whenValid("hold", "reason"),
  });
export type ProjectHoldInput = z.input<typeof ProjectHoldInput>;

export const PROJECT_SORTS = ["number", "customerName", "city", "stage", "daysInStage", "waitingSince", "createdAt"] as const;

const filingStatusFilter = (what: string) =>
  z.union([z.enum(FILING_STATUSES, { error: `${what} must be one of: ${FILING_STATUSES.join(", ")}` }), z.literal("")]).default("");

export const ProjectListQuery = z.object({
  page: z.coerce.number({ error: "page must be a number" }).int().min(1, "page starts at 1").max(10_000).default(1),
  pageSize: z.coerce.number({ error: "pageSize must be a number" }).int().min(1).max(100, "pageSize is at most 100").default(20),
  sort: z.enum(PROJECT_SORTS, { error: `sort must be one of: ${PROJECT_SORTS.join(", ")}` }).default("number"),
  direction: z.enum(["asc", "desc"], { error: "direction must be asc or desc" }).default("desc"),
  q: safeString().trim().max(100, "Search text is at most 100 characters").default(""),
  stage: z.union([StageSchema, z.literal("")]).default(""),
  // "nobody": PTO received, nobody holds it.
  waitingOn: z
    .union([
      z.enum([...WAITING_PARTIES, "nobody"], { error: `waitingOn must be one of: ${[...WAITING_PARTIES, "nobody"].join(", ")}` }),
      z.literal(""),
    ])
    .default(""),
  permitStatus: filingStatusFilter("permitStatus"),
  interconnectionStatus: filingStatusFilter("interconnectionStatus"),
  // Active projects are those neither on hold nor cancelled.
  hold: z.enum(["", "active", "on_hold", "cancelled"], { error: "hold must be active, on_hold or cancelled" }).default(""),
});
export type ProjectListQuery = z.infer<typeof ProjectListQuery>;
/** The list the start page opens on; the server renders this page so the table does not load after the page. */
export const FIRST_LIST_PAGE = { page: "1", pageSize: "20", sort: "number", direction: "desc" } as const;
