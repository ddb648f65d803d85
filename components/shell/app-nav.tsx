"use client";

import { clsx } from "clsx";
import Link from "next/link";
import { usePathname } from "next/navigation";

export function AppNav({ links }: { links: { href: string; label: string }[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="flex gap-1 overflow-x-auto text-sm">
      {links.map((link) => {
        const active =
          pathname === link.href ||
          (link.href !== "/dashboard" && pathname.startsWith(link.href + "/")) ||
          (link.href === "/dashboard" && pathname.startsWith("/projects/") && pathname !== "/projects/new");
        return (
          <Link
            key={link.href}
            href={link.href}
            aria-current={active ? "page" : undefined}
            className={clsx(
              "rounded px-3 py-1.5 no-underline hover:no-underline",
              active ? "bg-copper-light text-copper-dark" : "text-ink-soft hover:bg-paper-edge/60",
            )}
          >
            {link.label}
          </Link>
        );
      })}
    </nav>
  );
}
