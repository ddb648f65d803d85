import { expect, test } from "@playwright/test";
import { query } from "../../support/sql";
import { byId, enter } from "../support/field-record";
import { DEMO, listProjectsAs, pageFor } from "../support/session";

// A phone held upright, as on site.
test.use({ viewport: { width: 390, height: 844 }, hasTouch: true });

const sql = <T = Record<string, unknown>>(text: string, params: unknown[] = []) => query<T>(process.env.DATABASE_URL!, text, params);

// The project is a copy of one of the installer's demo projects with a string inverter, made a hybrid with two
// invented batteries in the garage and a backup loads panel, so the demo projects other specs read stay as they are.
let projectId: string;
const equipmentIds: string[] = [];

test.beforeAll(async ({ browser }) => {
  const phone = await pageFor(browser, DEMO.installer);
  const mine = (await listProjectsAs(phone)).map((p) => p.id);
  await phone.context().close();
  const [source] = await sql<{ project_id: string; draft: Record<string, any>; inverter_id: string }>(
    `SELECT d.project_id, d.draft, e.id AS inverter_id FROM designs d
       JOIN equipment e ON e.id::text = d.draft #>> '{equipment,inverters,0,equipmentId}'
      WHERE d.project_id = ANY($1::uuid[]) AND e.specs->>'inverterKind' = 'string'
        AND jsonb_array_length(d.draft #> '{equipment,inverters}') = 1
      ORDER BY d.project_id LIMIT 1`,
    [mine],
  );
  expect(source, "a demo project of the installer with one string inverter").toBeTruthy();

  const [battery] = await sql<{ id: string }>(
    `INSERT INTO equipment (id, organization_id, kind, maker, model, listing, specs, created_at, updated_at)
     SELECT gen_random_uuid(), organization_id, 'battery', 'Brindle', 'BX-13', 'UL 9540, UL 9540A', $2::jsonb, now(), now()
       FROM equipment WHERE id = $1 RETURNING id`,
    [
      source!.inverter_id,
      JSON.stringify({
        usableKwh: 12.6,
        nameplateKwh: 13.5,
        maxContinuousChargeA: 40,
        maxContinuousDischargeA: 50,
        maxChargeKw: 5,
        maxDischargeKw: 6,
        nominalVoltageV: 400,
        maxUnitsInParallel: 4,
      }),
    ],
  );
  const [hybrid] = await sql<{ id: string }>(
    `INSERT INTO equipment (id, organization_id, kind, maker, model, listing, specs, created_at, updated_at)
     SELECT gen_random_uuid(), organization_id, kind, maker, model || ' H', listing, specs || $2::jsonb, now(), now()
       FROM equipment WHERE id = $1 RETURNING id`,
    [
      source!.inverter_id,
      JSON.stringify({ storageRole: "multimode", backupContinuousA: 32, backupVoltageV: 240, transferTimeS: 0.02, pcsListed: true }),
    ],
  );
  equipmentIds.push(battery!.id, hybrid!.id);

  const draft = structuredClone(source!.draft);
  const line = draft.equipment.inverters[0];
  line.equipmentId = hybrid!.id;
  draft.storage = {
    coupling: "dc",
    multimodeInverterLineId: line.lineId,
    banks: [{ lineId: "b1", equipmentId: battery!.id, quantity: 2, location: "garage" }],
    operatingMode: "self-consumption",
    exportLimitKw: 5,
    pcsCurrentSettingA: 24,
    hasBackupPanel: true,
    backupBusbarA: 125,
    backupMainBreakerA: 100,
    backupInverterBreakerA: 40,
    backupInverterBreakerAtOppositeEnd: true,
    backupPanelVoltageV: "240",
    backupMultiwire: "no",
    backupLoads: [{ lineId: "l1", name: "refrigerator", currentA: 6, voltageV: "120" }],
    disconnectKind: "integral",
    circuits: [
      { lineId: "c1", label: "Batteries to inverter", kind: "battery-dc", material: "Cu", size: "1/0", insulationTempC: "90", ocpdA: 125 },
    ],
  };
  const [copy] = await sql<{ id: string }>(
    `INSERT INTO projects SELECT (jsonb_populate_record(NULL::projects, to_jsonb(p) || jsonb_build_object(
        'id', gen_random_uuid(), 'number', nextval(pg_get_serial_sequence('projects', 'number')),
        'customer_name', 'Wren Albrecht', 'stage', 'commissioned'))).*
       FROM projects p WHERE p.id = $1 RETURNING id`,
    [source!.project_id],
  );
  projectId = copy!.id;
  await sql(
    `INSERT INTO designs SELECT (jsonb_populate_record(NULL::designs, to_jsonb(d) || jsonb_build_object(
        'id', gen_random_uuid(), 'project_id', $2::uuid, 'draft', $3::jsonb))).*
       FROM designs d WHERE d.project_id = $1`,
    [source!.project_id, projectId, JSON.stringify(draft)],
  );
});

test.afterAll(async () => {
  // Designs and field records go with the project (ON DELETE CASCADE); the two catalog items go after.
  if (projectId) {
    const tables = await sql<{ table_name: string }>(
      `SELECT table_name FROM information_schema.columns WHERE column_name = 'project_id' AND table_schema = 'public' AND table_name <> 'projects'`,
    );
    for (const { table_name } of tables) await sql(`DELETE FROM "${table_name}" WHERE project_id = $1`, [projectId]);
    await sql(`DELETE FROM projects WHERE id = $1`, [projectId]);
  }
  if (equipmentIds.length) await sql(`DELETE FROM equipment WHERE id = ANY($1::uuid[])`, [equipmentIds]);
});

test("installer on a phone completes the storage part of the field record: stored-energy cautions first, the charge shown, the backup test timed against the inverter's transfer time, the power control setting and export limit read back against the design", async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const phone = await pageFor(browser, DEMO.installer);
  await phone.goto(`/projects/${projectId}/field`);
  await expect(phone.getByRole("heading", { name: "Field record" })).toBeVisible();
  await expect(phone.getByTestId("field-cautions")).toContainText("This system has batteries");

  const step = phone.getByTestId("step-storage");
  await expect(step.locator("h3")).toContainText("Energy storage");
  await expect(step).toContainText("2 × Brindle BX-13, DC-coupled through the hybrid inverter");
  // The cautions of stored energy stand above the readings.
  const cautions = step.getByTestId("storage-cautions");
  await expect(cautions).toContainText("A battery stays energized when the array and the grid are off");
  await expect(cautions).toContainText("manufacturer's instructions");
  const cautionsBox = (await cautions.boundingBox())!;
  const firstInput = (await byId(phone, "storage.stateOfChargePct").boundingBox())!;
  expect(cautionsBox.y + cautionsBox.height).toBeLessThanOrEqual(firstInput.y);

  // Nothing recorded yet: each storage reading is waiting to be taken.
  for (const id of ["storage-charge", "storage-backup", "storage-transfer-time", "storage-power-control", "storage-export-limit"])
    await expect(phone.getByTestId(`result-${id}`)).toHaveAttribute("data-reading", "missing");

  await enter(byId(phone, "storage.stateOfChargePct"), "82");
  await expect(phone.getByTestId("result-storage-charge")).toHaveAttribute("data-status", "pass");

  await expect(step).toContainText("The inverter states a transfer time of 0.02 s.");
  await step.getByRole("group", { name: "Grid supply opened" }).getByLabel("Yes").check();
  await step.getByRole("group", { name: "Backup loads panel stayed on" }).getByLabel("No").check();
  await expect(phone.getByTestId("result-storage-backup")).toHaveAttribute("data-status", "fail");
  await step.getByRole("group", { name: "Backup loads panel stayed on" }).getByLabel("Yes").check();
  await expect(phone.getByTestId("result-storage-backup")).toHaveAttribute("data-status", "pass");
  await enter(byId(phone, "storage.transferSeconds"), "3");
  await expect(phone.getByTestId("result-storage-transfer-time")).toHaveAttribute("data-status", "fail");
  await enter(byId(phone, "storage.transferSeconds"), "0");
  await expect(phone.getByTestId("result-storage-transfer-time")).toHaveAttribute("data-status", "pass");

  // Read back higher than designed: the busbar was checked for 24 A only.
  await expect(step).toContainText("Designed: 24 A.");
  await enter(byId(phone, "storage.pcsSettingA"), "32");
  await expect(phone.getByTestId("result-storage-power-control")).toHaveAttribute("data-status", "fail");
  await expect(phone.getByTestId("result-storage-power-control")).toContainText("Set the power control current setting to 24 A");
  await enter(byId(phone, "storage.pcsSettingA"), "24");
  await expect(phone.getByTestId("result-storage-power-control")).toHaveAttribute("data-status", "pass");
  await enter(byId(phone, "storage.exportLimitKw"), "5");
  await expect(phone.getByTestId("result-storage-export-limit")).toHaveAttribute("data-status", "pass");

  // Nothing spills sideways on a phone.
  expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

  await phone.getByRole("button", { name: "Save readings" }).click();
  await expect(phone.getByTestId("save-state")).toContainText("Saved");

  // Saved: the storage part comes back complete, and the record's open readings no longer include it.
  await phone.reload();
  await expect(byId(phone, "storage.stateOfChargePct")).toHaveValue("82");
  for (const id of ["storage-charge", "storage-backup", "storage-transfer-time", "storage-power-control", "storage-export-limit"])
    await expect(phone.getByTestId(`result-${id}`)).toHaveAttribute("data-status", "pass");
  const [row] = await sql<{ readings: { storage: Record<string, unknown> } }>(
    `SELECT readings FROM commissioning_records WHERE project_id = $1`,
    [projectId],
  );
  expect(row!.readings.storage).toEqual({
    stateOfChargePct: 82,
    gridOpened: true,
    panelCarried: true,
    transferSeconds: 0,
    pcsSettingA: 24,
    exportLimitKw: 5,
  });

  // The PV part is still open, so the record stays open; the storage part is no longer among what holds it.
  await phone.getByRole("button", { name: "Mark complete" }).click();
  await expect(phone.getByTestId("save-state")).toHaveText(/.+/);
  await expect(phone.getByTestId("commissioning-status")).toContainText("Open");
  await phone.screenshot({ path: test.info().outputPath("storage-step.png"), fullPage: true });
  await phone.context().close();
});
