import bcrypt from "bcryptjs";
import type { Sequelize, Transaction } from "sequelize";
import { FeeSchedule, Jurisdiction, Organization, Project, StageChange, User, Utility } from "@/models";
import { STAGES, type Stage } from "@/lib/domain/stages";
import { seedDemoCatalog } from "./demo-catalog";
import { DEMO_JURISDICTION_FEES, DEMO_UTILITY_FEES } from "./demo-fees";
import { seedDemoDesigns } from "./seed-demo-designs";
import { seedDemoDesk } from "./seed-demo-desk";
import { seedDemoFilings } from "./seed-demo-filings";
import { CUSTOMERS, JURISDICTIONS, ORGANIZATIONS, STAGE_NOTES, STREETS, TOWNS, UTILITIES } from "./demo-scenario";
import { DEMO_SIGN_INS } from "./demo-sign-ins.mjs";

const DAY_MS = 86_400_000;

/** A small deterministic generator so every fresh demo database looks the same. */
function rng(seed: number) {
  let s = seed;
  return () => {
    s = (s * 1_103_515_245 + 12_345) % 2 ** 31;
    return s / 2 ** 31;
  };
}

async function seedOrganization(
  key: "main" | "other",
  projectCount: number,
  t: Transaction,
  passwordHash: string,
  rand: () => number,
  now: number,
) {
  const organization = await Organization.create({ ...ORGANIZATIONS[key] }, { transaction: t });
  const organizationId = organization.id;
  const users: User[] = [];
  for (const u of DEMO_SIGN_INS.users.filter((x) => x.org === key)) {
    users.push(
      await User.create(
        { organizationId, email: u.email, name: u.name, role: u.role, passwordHash, lastSignInAt: null },
        { transaction: t },
      ),
    );
  }
  const jurisdictions = new Map<string, Jurisdiction>();
  for (const { key: k, ...j } of JURISDICTIONS)
    jurisdictions.set(k, await Jurisdiction.create({ organizationId, ...j }, { transaction: t }));
  const utilities = new Map<string, Utility>();
  for (const { key: k, ...u } of UTILITIES) utilities.set(k, await Utility.create({ organizationId, ...u }, { transaction: t }));
  for (const [k, j] of jurisdictions)
    await FeeSchedule.create(
      { organizationId, authorityKind: "jurisdiction", authorityId: j.id, lines: DEMO_JURISDICTION_FEES[k] ?? [], updatedById: null },
      { transaction: t },
    );
  for (const [k, u] of utilities)
    await FeeSchedule.create(
      { organizationId, authorityKind: "utility", authorityId: u.id, lines: DEMO_UTILITY_FEES[k] ?? [], updatedById: null },
      { transaction: t },
    );
  await seedDemoCatalog(organizationId, t);

  const coordinators = users.filter((u) => u.role === "coordinator");
  const installers = users.filter((u) => u.role === "installer");
  const offset = key === "main" ? 0 : 17;

  for (let i = 0; i < projectCount; i++) {
    // Spread over every stage; the second company's few projects start early in the pipeline.
    const stage: Stage = STAGES[key === "main" ? i % STAGES.length : i];
    const stageIdx = STAGES.indexOf(stage);
    const town = TOWNS[(i + offset) % TOWNS.length];
    const steps = Array.from({ length: stageIdx }, () => 2 + Math.floor(rand() * 12));
    const daysInStage = Math.floor(rand() * (stage === "closed" ? 40 : 16));
    let at = now - (steps.reduce((a, b) => a + b, 0) + daysInStage) * DAY_MS - Math.floor(rand() * 8) * 3_600_000;
    const createdAt = new Date(at);
    const coordinator = coordinators[i % coordinators.length];
    // Installers are assigned once the permit is issued, and to a few earlier projects already.
    const installer = installers.length && (stageIdx >= 3 || i % 4 === 1) ? installers[i % installers.length] : null;
    const mainBreakerA = [100, 150, 200, 200, 200][i % 5];
    const project = await Project.create(
      {
        organizationId,
        customerName: CUSTOMERS[(i + offset) % CUSTOMERS.length],
        customerEmail: `${CUSTOMERS[(i + offset) % CUSTOMERS.length].split(" ")[0].toLowerCase()}@mail.example`,
        customerPhone: `(555) 01${(i % 10).toString()}-${(3000 + i * 37).toString().slice(-4)}`,
        street: `${120 + ((i * 97) % 880)} ${STREETS[(i + offset) % STREETS.length]}`,
        city: town.city,
        state: "CO",
        postalCode: town.postalCode,
        jurisdictionId: jurisdictions.get(town.jurisdiction)!.id,
        utilityId: utilities.get(town.utility)!.id,
        utilityAccountNumber: `${town.utility === "bmlp" ? "BL" : "HM"}-${(4_410_000 + i * 7_919 + offset * 131).toString()}`,
        meterNumber: `M${(72_000_000 + i * 104_729).toString()}`,
        mainBreakerA,
        busbarA: mainBreakerA === 200 && i % 3 === 0 ? 225 : mainBreakerA,
        serviceVoltageV: 240,
        servicePhases: 1,
        stage,
        stageChangedAt: createdAt,
        coordinatorId: coordinator?.id ?? null,
        installerId: installer?.id ?? null,
        // Every other project has its valuation declared; the rest show the fee that waits for it.
        declaredValuationCents: i % 2 === 0 ? (18_000 + ((i * 1_337) % 14_000)) * 100 : null,
        createdAt,
        updatedAt: createdAt,
      },
      { transaction: t, silent: true },
    );
    const changes = [{ fromStage: null as Stage | null, toStage: "draft" as Stage, note: "Project created", createdAt: new Date(at) }];
    for (let s = 1; s <= stageIdx; s++) {
      at += steps[s - 1] * DAY_MS;
      changes.push({ fromStage: STAGES[s - 1], toStage: STAGES[s], note: STAGE_NOTES[STAGES[s]] ?? "", createdAt: new Date(at) });
    }
    await StageChange.bulkCreate(
      changes.map((c) => ({ ...c, organizationId, projectId: project.id, changedById: coordinator?.id ?? users[0].id })),
      { transaction: t },
    );
    await project.update({ stageChangedAt: changes[changes.length - 1].createdAt }, { transaction: t, silent: true });
  }
  await seedDemoDesigns(organizationId, t);
  await seedDemoFilings(organizationId, t);
  await seedDemoDesk(organizationId, t, now);
}

/** Seeds the invented demo scenario into an empty database; leaves a database with data untouched. */
export async function seedDemo(sequelize: Sequelize, { now = Date.now() } = {}): Promise<boolean> {
  if ((await Organization.count()) > 0) return false;
  const passwordHash = await bcrypt.hash(DEMO_SIGN_INS.password, 10);
  const rand = rng(20261201);
  await sequelize.transaction(async (t) => {
    await seedOrganization("main", 28, t, passwordHash, rand, now);
    await seedOrganization("other", 4, t, passwordHash, rand, now);
  });
  return true;
}
