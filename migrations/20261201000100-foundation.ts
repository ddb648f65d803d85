import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

const id = { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 };
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const org = { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" };
const userRef = (allowNull: boolean) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: "users", key: "id" },
  onDelete: "SET NULL",
});

export async function up({ context: q }: { context: MigrationContext }) {
  await q.createTable("organizations", {
    id,
    name: { type: DataTypes.STRING(200), allowNull: false },
    license_number: { type: DataTypes.STRING(60) },
    phone: { type: DataTypes.STRING(40) },
    ...timestamps,
  });

  await q.createTable("users", {
    id,
    organization_id: org,
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    password_hash: { type: DataTypes.STRING(100) },
    is_active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    last_sign_in_at: { type: DataTypes.DATE },
    ...timestamps,
  });
  await q.sequelize.query(`alter table users add constraint users_role_check check (role in ('admin','coordinator','installer'))`);
  await q.addIndex("users", ["organization_id"]);

  await q.createTable("invitations", {
    id,
    organization_id: org,
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE },
    created_by_id: userRef(true),
    ...timestamps,
  });

  await q.createTable("sign_in_attempts", {
    id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
    key: { type: DataTypes.STRING(300), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("sign_in_attempts", ["key", "created_at"]);

  await q.createTable("jurisdictions", {
    id,
    organization_id: org,
    name: { type: DataTypes.STRING(160), allowNull: false },
    state: { type: DataTypes.STRING(2), allowNull: false },
    nec_edition: { type: DataTypes.INTEGER, allowNull: false },
    record_low_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    high_design_temp_c: { type: DataTypes.DOUBLE, allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    ...timestamps,
  });
  await q.sequelize.query(
    `alter table jurisdictions add constraint jurisdictions_nec_edition_check check (nec_edition in (2017, 2020, 2023))`,
  );
  await q.addIndex("jurisdictions", ["organization_id"]);

  await q.createTable("utilities", {
    id,
    organization_id: org,
    name: { type: DataTypes.STRING(160), allowNull: false },
    service_voltages: { type: DataTypes.ARRAY(DataTypes.STRING(40)), allowNull: false, defaultValue: [] },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    ...timestamps,
  });
  await q.addIndex("utilities", ["organization_id"]);

  await q.createTable("projects", {
    id,
    organization_id: org,
    number: { type: DataTypes.INTEGER, autoIncrement: true, allowNull: false, unique: true },
    customer_name: { type: DataTypes.STRING(160), allowNull: false },
    customer_email: { type: DataTypes.STRING(254) },
    customer_phone: { type: DataTypes.STRING(40) },
    street: { type: DataTypes.STRING(200), allowNull: false },
    city: { type: DataTypes.STRING(100), allowNull: false },
    state: { type: DataTypes.STRING(2), allowNull: false },
    postal_code: { type: DataTypes.STRING(10), allowNull: false },
    jurisdiction_id: { type: DataTypes.UUID, references: { model: "jurisdictions", key: "id" }, onDelete: "SET NULL" },
    utility_id: { type: DataTypes.UUID, references: { model: "utilities", key: "id" }, onDelete: "SET NULL" },
    utility_account_number: { type: DataTypes.STRING(40) },
    meter_number: { type: DataTypes.STRING(40) },
    main_breaker_a: { type: DataTypes.INTEGER },
    busbar_a: { type: DataTypes.INTEGER },
    service_voltage_v: { type: DataTypes.INTEGER },
    service_phases: { type: DataTypes.INTEGER },
    stage: { type: DataTypes.STRING(30), allowNull: false, defaultValue: "draft" },
    stage_changed_at: { type: DataTypes.DATE, allowNull: false },
    coordinator_id: userRef(true),
    installer_id: userRef(true),
    ...timestamps,
  });
  await q.sequelize.query(
    `alter table projects add constraint projects_stage_check check (stage in ('draft','design_checked','permit_filed','permit_issued','installed','inspection_passed','utility_filed','utility_approved','commissioned','pto_received','closed'))`,
  );
  await q.addIndex("projects", ["organization_id", "stage"]);
  await q.addIndex("projects", ["organization_id", "installer_id"]);

  await q.createTable("stage_changes", {
    id,
    organization_id: org,
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    from_stage: { type: DataTypes.STRING(30) },
    to_stage: { type: DataTypes.STRING(30), allowNull: false },
    changed_by_id: userRef(true),
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("stage_changes", ["project_id", "created_at"]);

  await q.createTable("audit_events", {
    id,
    organization_id: org,
    actor_id: userRef(true),
    action: { type: DataTypes.STRING(60), allowNull: false },
    entity_type: { type: DataTypes.STRING(40), allowNull: false },
    entity_id: { type: DataTypes.UUID, allowNull: false },
    changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.addIndex("audit_events", ["organization_id", "entity_type", "entity_id"]);
}

export async function down({ context: q }: { context: MigrationContext }) {
  for (const table of [
    "audit_events",
    "stage_changes",
    "projects",
    "utilities",
    "jurisdictions",
    "sign_in_attempts",
    "invitations",
    "users",
    "organizations",
  ]) {
    await q.dropTable(table);
  }
}
