import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/lib/domain/permissions";
import { requirePermission } from "@/lib/server/auth";

export const metadata: Metadata = { title: "Settings" };

export default async function SettingsPage() {
  const viewer = await requirePermission("settings:view");
  const sections = [
    ...(can(viewer, "organization:edit")
      ? [
          {
            href: "/settings/organization",
            title: "Organization",
            text: "Company name, license number and phone as documents print them, and the time zone of their times.",
          },
        ]
      : []),
    ...(can(viewer, "users:manage")
      ? [{ href: "/settings/users", title: "Users", text: "Invite people, change roles, deactivate accounts." }]
      : []),
    ...(can(viewer, "catalog:view")
      ? [
          {
            href: "/settings/equipment",
            title: "Equipment catalog",
            text: "Modules, inverters and module-level devices with their data-sheet figures and PDFs.",
          },
        ]
      : []),
    {
      href: "/settings/jurisdictions",
      title: "Jurisdictions (AHJ)",
      text: "Adopted NEC edition, design temperatures and fee schedule of each authority.",
    },
    {
      href: "/settings/utilities",
      title: "Utilities",
      text: "Service voltages, required grid profile, fee schedule and notes of each utility.",
    },
    ...(can(viewer, "api-tokens:manage")
      ? [{ href: "/settings/api-tokens", title: "API tokens", text: "Keys for other programs to read projects and run design reviews." }]
      : []),
  ];
  return (
    <div className="space-y-4">
      <h1>Settings</h1>
      <ul className="grid gap-4 sm:grid-cols-3">
        {sections.map((s) => (
          <li key={s.href} className="panel">
            <Link href={s.href} className="font-semibold">
              {s.title}
            </Link>
            <p className="mt-1 text-sm text-ink-soft">{s.text}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
