import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Invitation, SignInAttempt, User } from "@/models";
import { AppError } from "@/lib/errors";
import { InviteUserInput } from "@/lib/schemas/user";
import { SIGN_IN_THROTTLE } from "@/lib/domain/sign-in-throttle";
import {
  acceptInvitation,
  authenticate,
  getInvitationByToken,
  inviteUser,
  listUsers,
  setUserActive,
  updateUserRole,
} from "@/lib/server/data/users";
import { closeDb } from "../../support/db";
import { hashToken } from "@/lib/server/tokens";
import { FIXTURE_PASSWORD, makeOrganization, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
const address = "203.0.113.7";
const code = async (promise: Promise<unknown>) =>
  promise.then(
    () => "resolved",
    (e: unknown) => (e instanceof AppError ? e.code : String(e)),
  );

beforeAll(async () => {
  org = await makeOrganization("People");
  rival = await makeOrganization("Rival people");
});

afterAll(async () => {
  await closeDb();
});

describe("invitations", () => {
  it("invites, lets the link set a password once, and then signs in", async () => {
    const input = InviteUserInput.parse({ name: "Nell Farrow", email: `Nell.${org.tag}@Fixture.example`, role: "coordinator" });
    const { user, token } = await inviteUser({ viewer: org.viewers.admin, input });
    expect(user).toMatchObject({ status: "invited", email: `nell.${org.tag}@fixture.example` });
    expect(await Invitation.count({ where: { tokenHash: hashToken(token) } })).toBe(1);
    expect(await Invitation.count({ where: { tokenHash: token } })).toBe(0); // only the hash is stored

    expect(await getInvitationByToken(token)).toMatchObject({ name: "Nell Farrow" });
    await acceptInvitation({ token, password: "a long new password" });
    expect(await getInvitationByToken(token)).toBeNull();
    expect(await code(acceptInvitation({ token, password: "another password" }))).toBe("NOT_FOUND");

    const viewer = await authenticate({ email: user.email, password: "a long new password", address });
    expect(viewer).toMatchObject({ id: user.id, role: "coordinator", organizationId: org.organization.id });
  });

  it("refuses an address already in the inviter's own organization", async () => {
    const input = InviteUserInput.parse({ name: "Copy", email: org.users.coordinator.email, role: "installer" });
    expect(await code(inviteUser({ viewer: org.viewers.admin, input }))).toBe("CONFLICT");
  });

  it("answers an invitation to another organization's address exactly as any other, and tells only the address's owner", async () => {
    // Defect: the invitation error told an admin that an address had an account in another company.
    const elsewhere = rival.users.coordinator.email;
    const fresh = `fresh.${org.tag}@fixture.example`;
    const a = await inviteUser({
      viewer: org.viewers.admin,
      input: InviteUserInput.parse({ name: "Known Elsewhere", email: elsewhere, role: "installer" }),
    });
    const b = await inviteUser({
      viewer: org.viewers.admin,
      input: InviteUserInput.parse({ name: "Never Seen", email: fresh, role: "installer" }),
    });
    const shape = (u: typeof a.user) => ({ ...u, id: "", email: "", name: "" });
    expect(shape(a.user)).toEqual(shape(b.user));
    const listed = await listUsers({ viewer: org.viewers.admin });
    expect(listed.find((u) => u.email === elsewhere)?.status).toBe("invited");

    // The person behind the address learns of the clash on the link, and nothing changes in either organization.
    expect((await getInvitationByToken(a.token))?.clash).toMatch(/already signs in .* for another organization/);
    expect((await getInvitationByToken(b.token))?.clash).toBeNull();
    expect(await code(acceptInvitation({ token: a.token, password: "a long new password" }))).toBe("CONFLICT");
    expect(await authenticate({ email: elsewhere, password: FIXTURE_PASSWORD, address })).toMatchObject({
      organizationId: rival.organization.id,
    });

    // Once the other organization deactivates that account, the same link works and signs in here.
    await setUserActive({ viewer: rival.viewers.admin, userId: rival.users.coordinator.id, isActive: false });
    await acceptInvitation({ token: a.token, password: "a long new password" });
    expect(await authenticate({ email: elsewhere, password: "a long new password", address })).toMatchObject({
      organizationId: org.organization.id,
    });
    expect(await code(setUserActive({ viewer: rival.viewers.admin, userId: rival.users.coordinator.id, isActive: true }))).toBe("CONFLICT");
  });

  it("refuses an expired link", async () => {
    const input = InviteUserInput.parse({ name: "Late Comer", email: `late.${org.tag}@fixture.example`, role: "installer" });
    const { token } = await inviteUser({ viewer: org.viewers.admin, input });
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { tokenHash: hashToken(token) } });
    expect(await getInvitationByToken(token)).toBeNull();
    expect(await code(acceptInvitation({ token, password: "whatever password" }))).toBe("NOT_FOUND");
  });
});

describe("authenticate", () => {
  it("rejects a wrong password with one message for unknown and known accounts", async () => {
    const known = await authenticate({ email: org.users.installer.email, password: "wrong", address }).catch((e) => e.message);
    const unknown = await authenticate({ email: `nobody-${org.tag}@fixture.example`, password: "wrong", address }).catch((e) => e.message);
    expect(known).toBe(unknown);
  });

  it("slows one address's guesses on one account with growing pauses, without holding the owner elsewhere", async () => {
    // Defect: five wrong passwords from anywhere locked the real user out for 15 minutes.
    const email = org.users.otherInstaller.email;
    const attacker = "198.51.100.7";
    for (let i = 0; i < SIGN_IN_THROTTLE.freePairFailures; i++) {
      expect(await code(authenticate({ email, password: "wrong", address: attacker }))).toBe("UNAUTHORIZED");
    }
    const paused = await authenticate({ email, password: "wrong", address: attacker }).catch((e: AppError) => e);
    expect(paused).toMatchObject({ code: "LIMIT_EXCEEDED" });
    expect((paused as AppError).message).toMatch(/Try again in \d+ seconds?\. The account is not locked\./);
    // The owner, from their own address, signs in at once with the right password.
    expect(await code(authenticate({ email, password: FIXTURE_PASSWORD, address: "198.51.100.99" }))).toBe("resolved");
  });

  it("pauses addresses new to an account under distributed guessing, but not one the owner has used", async () => {
    const email = org.users.coordinator.email;
    const home = "203.0.113.200";
    expect(await code(authenticate({ email, password: FIXTURE_PASSWORD, address: home }))).toBe("resolved");
    for (let i = 0; i < SIGN_IN_THROTTLE.accountAlarmFailures; i++) {
      expect(await code(authenticate({ email, password: "wrong", address: `198.18.0.${i}` }))).toBe("UNAUTHORIZED");
    }
    expect(await code(authenticate({ email, password: "wrong", address: "198.18.1.1" }))).toBe("LIMIT_EXCEEDED");
    expect(await code(authenticate({ email, password: FIXTURE_PASSWORD, address: home }))).toBe("resolved");
  });

  it(`makes one address wait after ${SIGN_IN_THROTTLE.maxAddressFailures} failures across accounts`, async () => {
    const from = "192.0.2.44";
    for (let i = 0; i < SIGN_IN_THROTTLE.maxAddressFailures; i++) {
      await code(authenticate({ email: `guess${i}-${org.tag}@fixture.example`, password: "wrong", address: from }));
    }
    expect(await code(authenticate({ email: org.users.admin.email, password: FIXTURE_PASSWORD, address: from }))).toBe("LIMIT_EXCEEDED");
    expect(await code(authenticate({ email: org.users.admin.email, password: FIXTURE_PASSWORD, address: "192.0.2.45" }))).toBe("resolved");
  });

  it("checks parallel guesses one at a time, so none slips past a pause", async () => {
    const email = `parallel-${org.tag}@fixture.example`;
    const results = await Promise.all(
      Array.from({ length: 12 }, () => code(authenticate({ email, password: "wrong", address: "198.51.100.77" }))),
    );
    expect(results.filter((r) => r === "UNAUTHORIZED")).toHaveLength(SIGN_IN_THROTTLE.freePairFailures);
    expect(await SignInAttempt.count({ where: { key: `pair:${email}|198.51.100.77` } })).toBe(SIGN_IN_THROTTLE.freePairFailures);
  });
});

describe("user administration", () => {
  it("changes a role and deactivates, within the organization only", async () => {
    const target = org.users.installer;
    expect((await updateUserRole({ viewer: org.viewers.admin, userId: target.id, role: "coordinator" })).role).toBe("coordinator");
    expect(await code(updateUserRole({ viewer: rival.viewers.admin, userId: target.id, role: "admin" }))).toBe("NOT_FOUND");
    expect(await code(setUserActive({ viewer: org.viewers.admin, userId: org.users.admin.id, isActive: false }))).toBe("CONFLICT");

    await setUserActive({ viewer: org.viewers.admin, userId: target.id, isActive: false });
    expect((await User.findByPk(target.id))?.isActive).toBe(false);
    expect(await code(authenticate({ email: target.email, password: FIXTURE_PASSWORD, address }))).toBe("FORBIDDEN");
    const listed = await listUsers({ viewer: org.viewers.admin });
    expect(listed.find((u) => u.id === target.id)?.status).toBe("deactivated");
    const rivalIds = Object.values(rival.users).map((u) => u.id);
    expect(listed.filter((u) => rivalIds.includes(u.id))).toEqual([]);
  });
});
