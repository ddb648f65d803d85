import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Invitation, SignInAttempt, User } from "@/models";
import { AppError } from "@/lib/errors";
import { InviteUserInput } from "@/lib/schemas/user";
import { THROTTLE } from "@/lib/server/data/sign-in-throttle";
import { acceptInvitation, authenticate, getInvitationByToken, inviteUser, listUsers, setUserActive, updateUserRole } from "@/lib/server/data/users";
import { closeDb } from "../../support/db";
import { hashToken } from "@/lib/server/tokens";
import { FIXTURE_PASSWORD, makeOrganization, type OrgFixture } from "../../support/fixtures";

let org: OrgFixture;
let rival: OrgFixture;
const address = "203.0.113.7";
const code = async (promise: Promise<unknown>) => promise.then(() => "resolved", (e: unknown) => (e instanceof AppError ? e.code : String(e)));

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

  it("refuses an e-mail address already in use", async () => {
    const input = InviteUserInput.parse({ name: "Copy", email: org.users.coordinator.email, role: "installer" });
    expect(await code(inviteUser({ viewer: org.viewers.admin, input }))).toBe("CONFLICT");
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

  it(`throttles an account after ${THROTTLE.maxFailuresPerAccount} failures, even with the right password`, async () => {
    const email = org.users.otherInstaller.email;
    for (let i = 0; i < THROTTLE.maxFailuresPerAccount; i++) {
      expect(await code(authenticate({ email, password: "wrong", address: `198.51.100.${i}` }))).toBe("UNAUTHORIZED");
    }
    expect(await code(authenticate({ email, password: FIXTURE_PASSWORD, address: "198.51.100.99" }))).toBe("LIMIT_EXCEEDED");
    await SignInAttempt.destroy({ where: { key: `account:${email}` } });
    expect(await code(authenticate({ email, password: FIXTURE_PASSWORD, address: "198.51.100.99" }))).toBe("resolved");
  });

  it(`throttles an address after ${THROTTLE.maxFailuresPerAddress} failures across accounts`, async () => {
    const from = "192.0.2.44";
    for (let i = 0; i < THROTTLE.maxFailuresPerAddress; i++) {
      await code(authenticate({ email: `guess${i}-${org.tag}@fixture.example`, password: "wrong", address: from }));
    }
    expect(await code(authenticate({ email: org.users.admin.email, password: FIXTURE_PASSWORD, address: from }))).toBe("LIMIT_EXCEEDED");
    expect(await code(authenticate({ email: org.users.admin.email, password: FIXTURE_PASSWORD, address: "192.0.2.45" }))).toBe("resolved");
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
    expect(listed.every((u) => !u.email.includes(rival.tag))).toBe(true);
  });
});
