import { DataTypes } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

export async function up({ context: q }: { context: MigrationContext }) {
  // One document put up for signatures; the original is kept as stored, each signing makes a new signed copy.
  await q.createTable("signature_requests", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false, references: { model: "organizations", key: "id" }, onDelete: "CASCADE" },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: "projects", key: "id" }, onDelete: "CASCADE" },
    document_kind: { type: DataTypes.STRING(30), allowNull: false },
    packet_id: { type: DataTypes.UUID, references: { model: "packets", key: "id" }, onDelete: "SET NULL" },
    title: { type: DataTypes.STRING(200), allowNull: false },
    original_key: { type: DataTypes.STRING(300), allowNull: false },
    original_sha256: { type: DataTypes.STRING(64), allowNull: false },
    signed_key: { type: DataTypes.STRING(300) },
    signed_sha256: { type: DataTypes.STRING(64) },
    signed_at: { type: DataTypes.DATE },
    created_by_id: { type: DataTypes.UUID, references: { model: "users", key: "id" }, onDelete: "SET NULL" },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table signature_requests add constraint signature_requests_kind_check
     check (document_kind in ('interconnection-application','agent-authorization','completion-certificate'))`,
  );
  await q.addIndex("signature_requests", ["project_id", "created_at"], { name: "signature_requests_project" });
  await q.addIndex("signature_requests", ["packet_id"], { name: "signature_requests_packet" });

  // Each signer: a link of their own (only the token's hash), or in person on a signed-in phone (no token).
  await q.createTable("signature_signers", {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    organization_id: { type: DataTypes.UUID, allowNull: false },
    signature_request_id: {
      type: DataTypes.UUID,
      allowNull: false,
      references: { model: "signature_requests", key: "id" },
      onDelete: "CASCADE",
    },
    role: { type: DataTypes.STRING(20), allowNull: false },
    channel: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "link" },
    name: { type: DataTypes.STRING(200), allowNull: false },
    email: { type: DataTypes.STRING(254), allowNull: false, defaultValue: "" },
    token_hash: { type: DataTypes.STRING(64), unique: true },
    expires_at: { type: DataTypes.DATE },
    status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: "sent" },
    decline_reason: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    consent_text: { type: DataTypes.TEXT },
    consented_at: { type: DataTypes.DATE },
    mark_kind: { type: DataTypes.STRING(10) },
    mark_key: { type: DataTypes.STRING(300) },
    typed_name: { type: DataTypes.STRING(200) },
    address: { type: DataTypes.STRING(100), allowNull: false, defaultValue: "" },
    user_agent: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
    opened_at: { type: DataTypes.DATE },
    signed_at: { type: DataTypes.DATE },
    declined_at: { type: DataTypes.DATE },
    revoked_at: { type: DataTypes.DATE },
    reminded_at: { type: DataTypes.DATE },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table signature_signers
       add constraint signature_signers_role_check check (role in ('customer','second-owner','installer')),
       add constraint signature_signers_channel_check check (channel in ('link','in-person')),
       add constraint signature_signers_status_check check (status in ('sent','opened','signed','declined','revoked')),
       add constraint signature_signers_mark_check check (mark_kind is null or mark_kind in ('drawn','typed')),
       add constraint signature_signers_link_check check (channel = 'in-person' or (token_hash is not null and expires_at is not null))`,
  );
  await q.addIndex("signature_signers", ["signature_request_id"], { name: "signature_signers_request" });
  // The desk reads the organization's unanswered links.
  await q.sequelize.query(
    `create index signature_signers_waiting on signature_signers (organization_id, expires_at) where status in ('sent','opened')`,
  );

  // Every opening, page view, download, signature and refusal through a link, as for inspector links.
  await q.createTable("signature_link_accesses", {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    signer_id: { type: DataTypes.UUID, allowNull: false, references: { model: "signature_signers", key: "id" }, onDelete: "CASCADE" },
    kind: { type: DataTypes.STRING(10), allowNull: false },
    address: { type: DataTypes.STRING(100), allowNull: false },
    user_agent: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await q.sequelize.query(
    `alter table signature_link_accesses add constraint signature_link_accesses_kind_check
     check (kind in ('view','page','download','sign','decline'))`,
  );
  await q.addIndex("signature_link_accesses", ["signer_id", "created_at"], { name: "signature_link_accesses_signer_time" });
}

export async function down({ context: q }: { context: MigrationContext }) {
  await q.dropTable("signature_link_accesses");
  await q.dropTable("signature_signers");
  await q.dropTable("signature_requests");
}
