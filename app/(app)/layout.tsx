import Link from "next/link";
import { Wordmark } from "@/components/brand/wordmark";
import { AppNav } from "@/components/shell/app-nav";
import { can } from "@/lib/domain/permissions";
import { ROLE_LABELS } from "@/lib/domain/roles";
import { TimeZoneProvider } from "@/components/time/local-time";
import { requireUser } from "@/lib/server/auth";
import { getOrganization } from "@/lib/server/data/organizations";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  // Convenience redirect only; every page, action and route checks again.
  const viewer = await requireUser();
  const { timeZone } = await getOrganization({ viewer });
  const links = [
    { href: "/dashboard", label: "Projects" },
    ...(can(viewer, "project:create") ? [{ href: "/projects/new", label: "New project" }] : []),
    ...(can(viewer, "reports:view") ? [{ href: "/reports", label: "Reports" }] : []),
    ...(can(viewer, "settings:view") ? [{ href: "/settings", label: "Settings" }] : []),
  ];
  return (
    <div className="min-h-screen">
      <header className="border-b border-paper-edge bg-paper-deep/60">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <Link href="/dashboard" className="no-underline hover:no-underline" aria-label="Ohmstead projects">
            <Wordmark />
          </Link>
          <AppNav links={links} />
          <div className="ml-auto flex items-center gap-3 text-sm">
            <Link href="/profile" className="text-ink-soft" data-testid="viewer" title="Your profile">
              {viewer.name} · <span className="text-ink-faint">{ROLE_LABELS[viewer.role]}</span>
            </Link>
            <Link href="/sign-out">Sign out</Link>
          </div>
        </div>
      </header>
      <main className="mx-auto max-w-6xl px-4 py-6">
        <TimeZoneProvider timeZone={timeZone}>{children}</TimeZoneProvider>
      </main>
    </div>
  );
}
