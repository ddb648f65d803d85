import Link from "next/link";
import type { ReactNode } from "react";

/** The heading of a page inside a project: a way back to the project, the page's title and what it is for. */
export function ProjectSubpageHeader({
  project,
  title,
  children,
}: {
  project: { id: string; customerName: string; address: string };
  title: string;
  children: ReactNode;
}) {
  return (
    <div>
      <p className="text-sm text-ink-faint">
        <Link href={`/projects/${project.id}`}>{project.customerName}</Link> · {project.address}
      </p>
      <h1>{title}</h1>
      <p className="text-sm text-ink-soft">{children}</p>
    </div>
  );
}
