import { randomUUID } from "node:crypto";
import bcrypt from "bcryptjs";
import { Jurisdiction, Organization, Project, User, Utility } from "@/models";
import type { Viewer } from "@/lib/domain/permissions";
import type { Role } from "@/lib/domain/roles";
import { db } from "@/lib/server/db";

export const FIXTURE_PASSWORD = "fixture-password-1";
let passwordHash: string | undefined;

const asViewer = (u: User): Viewer => ({ id: u.id, organizationId: u.organizationId, role: u.role, name: u.name, email: u.email });

/** An organization with one user per role, a jurisdiction, a utility and no projects; unique per call. */
export async function makeOrganization(label = "Test") {
  db();
  passwordHash ??= await bcrypt.hash(FIXTURE_PASSWORD, 4);
  const tag = randomUUID().slice(0, 8);
  const organization = await Organization.create({ name: `${label} ${tag}`, licenseNumber: null, phone: null });
  const user = async (role: Role, name: string) =>
    User.create({
      organizationId: organization.id,
      email: `${name.split(" ")[0].toLowerCase()}-${tag}@fixture.example`,
      name,
      role,
      passwordHash: passwordHash!,
      lastSignInAt: null,
    });
  const admin = await user("admin", "Ada Admin");
  const coordinator = await user("coordinator", "Cora Coordinator");
  const installer = await user("installer", "Ivo Installer");
  const otherInstaller = await user("installer", "Ines Installer");
  const jurisdiction = await Jurisdiction.create({
    organizationId: organization.id,
    name: `Fixture AHJ ${tag}`,
    state: "CO",
    necEdition: 2020,
    recordLowTempC: -20,
    highDesignTempC: 33,
    notes: "",
  });
  const utility = await Utility.create({
    organizationId: organization.id,
    name: `Fixture Utility ${tag}`,
    serviceVoltages: ["120/240 V"],
    notes: "",
  });
  return {
    organization,
    tag,
    jurisdiction,
    utility,
    users: { admin, coordinator, installer, otherInstaller },
    viewers: {
      admin: asViewer(admin),
      coordinator: asViewer(coordinator),
      installer: asViewer(installer),
      otherInstaller: asViewer(otherInstaller),
    },
  };
}

export type OrgFixture = Awaited<ReturnType<typeof makeOrganization>>;

export async function makeProject(org: OrgFixture, overrides: Partial<Parameters<typeof Project.create>[0]> = {}) {
  return Project.create({
    organizationId: org.organization.id,
    customerName: "Fixture Customer",
    customerEmail: null,
    customerPhone: null,
    street: "1 Fixture Way",
    city: "Testville",
    state: "CO",
    postalCode: "80000",
    jurisdictionId: org.jurisdiction.id,
    utilityId: org.utility.id,
    utilityAccountNumber: null,
    meterNumber: null,
    mainBreakerA: 200,
    busbarA: 200,
    serviceVoltageV: 240,
    servicePhases: 1,
    coordinatorId: org.users.coordinator.id,
    installerId: null,
    ...overrides,
  });
}

/** The raw form values a coordinator would submit, as strings. */
export function projectFormValues(org: OrgFixture, overrides: Record<string, unknown> = {}) {
  return {
    customerName: "Wren Alderley",
    customerEmail: "wren@mail.example",
    customerPhone: "",
    street: "44 Cinder Lane",
    city: "Testville",
    state: "co",
    postalCode: "80001",
    jurisdictionId: org.jurisdiction.id,
    utilityId: org.utility.id,
    utilityAccountNumber: "AC-100200",
    meterNumber: "",
    mainBreakerA: "200",
    busbarA: "225",
    serviceVoltageV: "240",
    servicePhases: "1",
    coordinatorId: org.users.coordinator.id,
    installerId: "",
    ...overrides,
  };
}
