import { createServer } from "node:net";
import { randomUUID } from "node:crypto";
import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Op } from "sequelize";
import { OutboxMessage } from "@/models";
import { InviteUserInput } from "@/lib/schemas/user";
import { inviteUser } from "@/lib/server/data/users";
import { db } from "@/lib/server/db";
import { createMailTransport } from "@/lib/server/services/mail";
import { enqueueMail } from "@/lib/server/data/outbox";
import { deliverDueMail } from "@/lib/server/jobs/deliver-mail";
import { closeDb } from "../../support/db";
import { makeOrganization, type OrgFixture } from "../../support/fixtures";

// A catcher of our own on a free loopback port, which the test stops and starts at will.
let port = 0;
let server: SMTPServer | null = null;
const received: string[] = []; // subject lines, one per accepted message

async function freePort() {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", resolve));
  const { port } = probe.address() as { port: number };
  await new Promise((resolve) => probe.close(resolve));
  return port;
}

async function startCatcher() {
  server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      let raw = "";
      stream.on("data", (chunk: Buffer) => (raw += chunk.toString("utf8")));
      stream.on("end", () => {
        received.push(/^Subject: (.*)$/m.exec(raw)?.[1].trim() ?? "");
        callback();
      });
    },
  });
  await new Promise<void>((resolve) => server!.listen(port, "127.0.0.1", resolve));
}

async function stopCatcher() {
  await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
  server = null;
}

let org: OrgFixture;
const transport = () => createMailTransport(`smtp://127.0.0.1:${port}`);
const mail = (subject: string) => ({ to: "reader@fixture.example", subject, text: "Plain body", html: "<p>Plain body</p>" });
const timesReceived = (subject: string) => received.filter((s) => s === subject).length;
const rowsTagged = (tag: string) => OutboxMessage.findAll({ where: { subject: { [Op.like]: `%${tag}%` } }, order: [["subject", "ASC"]] });

beforeAll(async () => {
  org = await makeOrganization("Outbox");
  port = await freePort();
});

afterAll(async () => {
  await stopCatcher();
  await closeDb();
});

describe("outbox", () => {
  it("sends only committed mail, keeps it while SMTP is down, and delivers each message exactly once", async () => {
    const tag = randomUUID().slice(0, 8);
    const rollback = new Error("change abandoned");
    await expect(
      db().transaction(async (transaction) => {
        for (const n of [1, 2, 3]) await enqueueMail(mail(`Dropped ${n} ${tag}`), { transaction });
        throw rollback;
      }),
    ).rejects.toBe(rollback);
    await db().transaction(async (transaction) => {
      for (const n of [1, 2, 3]) await enqueueMail({ ...mail(`Kept ${n} ${tag}`), organizationId: org.organization.id }, { transaction });
    });
    expect((await rowsTagged(tag)).map((r) => r.subject)).toEqual([`Kept 1 ${tag}`, `Kept 2 ${tag}`, `Kept 3 ${tag}`]);

    // The catcher is down: every try fails and is rescheduled.
    const before = Date.now();
    await deliverDueMail({ limit: 200, transport: transport() });
    for (const row of await rowsTagged(tag)) {
      expect(row).toMatchObject({ status: "queued", attempts: 1, sentAt: null });
      expect(row.nextAttemptAt.getTime()).toBeGreaterThan(before);
      expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
    }
    // Nothing is due yet, so a second round does not touch them.
    await deliverDueMail({ limit: 200, transport: transport() });
    expect((await rowsTagged(tag)).every((r) => r.attempts === 1)).toBe(true);

    await startCatcher();
    await OutboxMessage.update({ nextAttemptAt: new Date() }, { where: { subject: { [Op.like]: `%${tag}%` } } });
    await deliverDueMail({ limit: 200, transport: transport() });
    await deliverDueMail({ limit: 200, transport: transport() }); // a later round must not resend

    for (const n of [1, 2, 3]) {
      expect(timesReceived(`Kept ${n} ${tag}`)).toBe(1);
      expect(timesReceived(`Dropped ${n} ${tag}`)).toBe(0);
    }
    for (const row of await rowsTagged(tag)) {
      expect(row).toMatchObject({ status: "sent", attempts: 2, lastError: null });
      expect(row.smtpResponse).toMatch(/^250/);
      expect(row.sentAt).toBeInstanceOf(Date);
    }
  });

  it("never sends a row twice when two workers deliver at once", async () => {
    if (!server) await startCatcher();
    const tag = randomUUID().slice(0, 8);
    await db().transaction(async (transaction) => {
      for (let n = 0; n < 12; n++) await enqueueMail(mail(`Race ${String(n).padStart(2, "0")} ${tag}`), { transaction });
    });
    const [a, b] = await Promise.all([
      deliverDueMail({ limit: 200, transport: transport() }),
      deliverDueMail({ limit: 200, transport: transport() }),
    ]);
    expect(a.sent + b.sent).toBeGreaterThanOrEqual(12);
    for (let n = 0; n < 12; n++) expect(timesReceived(`Race ${String(n).padStart(2, "0")} ${tag}`)).toBe(1);
    expect((await rowsTagged(tag)).every((r) => r.status === "sent" && r.attempts === 1)).toBe(true);
  });

  it("gives up after the last retry and keeps the error", async () => {
    await stopCatcher();
    const tag = randomUUID().slice(0, 8);
    const { id } = await enqueueMail(mail(`Doomed ${tag}`));
    await OutboxMessage.update({ attempts: 11 }, { where: { id } });
    await deliverDueMail({ limit: 200, transport: transport() });
    const row = await OutboxMessage.findByPk(id);
    expect(row).toMatchObject({ status: "failed", attempts: 12 });
    expect(row?.lastError).toBeTruthy();
  });

  it("queues the invitation e-mail with the new user", async () => {
    const email = `outbox-invitee-${org.tag}@fixture.example`;
    const { token } = await inviteUser({
      viewer: org.viewers.admin,
      input: InviteUserInput.parse({ name: "Oda Outbox", email, role: "installer" }),
    });
    const row = await OutboxMessage.findOne({ where: { toAddress: email } });
    expect(row).toMatchObject({ status: "queued", organizationId: org.organization.id });
    expect(row?.subject).toContain(org.organization.name);
    expect(row?.textBody).toContain(`/invitation/${token}`);
    expect(row?.htmlBody).toContain(`/invitation/${token}`);
  });
});
