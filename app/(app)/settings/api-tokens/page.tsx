import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { listApiTokens } from "@/lib/server/data/api-tokens";
import { CreateTokenForm } from "./_components/create-token-form";
import { RevokeTokenButton } from "./_components/revoke-token-button";
import { LocalTime } from "@/components/time/local-time";
import { DataTable } from "@/components/ui/data-table";
import { createApiTokenAction, revokeApiTokenAction } from "./actions";

export const metadata: Metadata = { title: "API tokens" };

const when = (iso: string | null) => (iso ? <LocalTime iso={iso} /> : "Never");

export default async function ApiTokensPage() {
  const viewer = await requirePermission("api-tokens:manage");
  const tokens = await listApiTokens({ viewer });
  return (
    <div className="space-y-6">
      <div>
        <h1>API tokens</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          A token lets another program review designs (POST /api/v1/design-review) and read your company’s projects, designs and reviews. It
          can never change anything, and it works until you revoke it.
        </p>
      </div>
      <section className="panel">
        <h2 className="mb-3">Create a token</h2>
        <CreateTokenForm create={createApiTokenAction} />
      </section>
      <DataTable columns={["Name", "Created", "Last used", "Status", { label: "Actions", hidden: true }]}>
        {tokens.length === 0 ? (
          <tr>
            <td colSpan={5} className="px-3 py-4 text-ink-soft">
              No tokens yet.
            </td>
          </tr>
        ) : null}
        {tokens.map((t) => (
          <tr key={t.id} className="border-b border-paper-edge/70 last:border-0" data-testid="api-token-row">
            <td className="px-3 py-2 font-medium">{t.name}</td>
            <td className="px-3 py-2 text-ink-soft">
              {when(t.createdAt)}
              {t.createdByName ? <span className="block text-xs text-ink-faint">by {t.createdByName}</span> : null}
            </td>
            <td className="px-3 py-2 text-ink-soft">{when(t.lastUsedAt)}</td>
            <td className="px-3 py-2 text-ink-soft">{t.revokedAt ? <>Revoked {when(t.revokedAt)}</> : "Active"}</td>
            <td className="px-3 py-2 text-right">
              {t.revokedAt ? null : <RevokeTokenButton apiTokenId={t.id} name={t.name} revokeToken={revokeApiTokenAction} />}
            </td>
          </tr>
        ))}
      </DataTable>
    </div>
  );
}
