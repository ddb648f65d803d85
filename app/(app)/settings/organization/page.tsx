import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { getOrganization } from "@/lib/server/data/organizations";
import { OrganizationForm } from "./_components/organization-form";
import { updateOrganizationAction } from "./actions";

export const metadata: Metadata = { title: "Organization" };

export default async function OrganizationPage() {
  const viewer = await requirePermission("organization:edit");
  const o = await getOrganization({ viewer });
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <div>
        <h1>Organization</h1>
        <p className="text-sm text-ink-soft">
          How your company appears on packets, field reports and receipts, and the time zone their times are printed in.
        </p>
      </div>
      <section className="panel">
        <OrganizationForm
          update={updateOrganizationAction}
          initial={{ name: o.name, licenseNumber: o.licenseNumber ?? "", phone: o.phone ?? "", timeZone: o.timeZone }}
        />
      </section>
    </div>
  );
}
