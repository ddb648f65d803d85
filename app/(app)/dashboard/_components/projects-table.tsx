"use client";

import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import Link from "next/link";
import { useEffect, useMemo, useState } from "react";
import useSWR from "swr";
import { PastUsualMark } from "@/components/desk/past-usual-mark";
import { StageBadge } from "@/components/ui/stage-badge";
import { WAITING_PARTIES, WAITING_PARTY_LABELS } from "@/lib/domain/filings";
import { STAGES, STAGE_LABELS, stageIndex } from "@/lib/domain/stages";
import type { ProjectDto } from "@/lib/dto/projects";
import { FIRST_LIST_PAGE } from "@/lib/schemas/project";

export type ProjectListPage = { items: ProjectDto[]; total: number; page: number; pageSize: number; pageCount: number };

async function fetchJson(url: string): Promise<ProjectListPage> {
  const res = await fetch(url);
  const body = await res.json().catch(() => null);
  if (!res.ok) throw new Error(body?.error?.message ?? `The project list could not be loaded (${res.status}).`);
  return body;
}

const column = createColumnHelper<ProjectDto>();

const COLUMNS = [
  column.accessor("number", { id: "number", header: "No.", cell: (c) => <span className="measure text-ink-faint">{c.getValue()}</span> }),
  column.accessor("customerName", {
    id: "customerName",
    header: "Customer",
    cell: (c) => (
      <div>
        <Link href={`/projects/${c.row.original.id}`} className="font-medium">
          {c.getValue()}
        </Link>
        <div className="text-xs text-ink-faint">{c.row.original.street}</div>
      </div>
    ),
  }),
  column.accessor("city", { id: "city", header: "Town" }),
  column.accessor("stage", {
    id: "stage",
    header: "Stage",
    cell: (c) => (
      <div>
        <StageBadge stage={c.getValue()} />
        {c.row.original.holdState ? <HoldMark state={c.row.original.holdState} /> : null}
        <div className="text-xs text-ink-faint">{c.row.original.nextAction}</div>
      </div>
    ),
  }),
  column.accessor("daysInStage", {
    id: "daysInStage",
    header: "Days in stage",
    cell: (c) => <span className="measure">{c.getValue()}</span>,
  }),
  column.accessor("waitingSince", {
    id: "waitingSince",
    header: "Waiting on",
    cell: (c) => <WaitingOn project={c.row.original} />,
  }),
  column.accessor((p) => p.jurisdiction?.name ?? "—", { id: "jurisdiction", header: "AHJ", enableSorting: false }),
  column.accessor((p) => p.utility?.name ?? "—", { id: "utility", header: "Utility", enableSorting: false }),
  column.accessor((p) => p.coordinator?.name ?? "—", { id: "coordinator", header: "Coordinator", enableSorting: false }),
  column.accessor((p) => p.installer?.name ?? "Unassigned", { id: "installer", header: "Installer", enableSorting: false }),
];

/** A project set aside, beside its stage. */
function HoldMark({ state }: { state: "on_hold" | "cancelled" }) {
  return (
    <span className="ml-1 rounded border border-result-warn/40 px-1.5 py-0.5 text-xs">{state === "on_hold" ? "On hold" : "Cancelled"}</span>
  );
}

/** Who holds the project and for how many days, from its filings. */
function WaitingOn({ project }: { project: ProjectDto }) {
  if (!project.waitingOn) return <span className="text-ink-faint">Nobody</span>;
  return (
    <span data-testid="waiting-on-cell" className="whitespace-nowrap">
      {WAITING_PARTY_LABELS[project.waitingOn]}
      {project.waitingDays !== null ? <span className="measure text-xs text-ink-faint"> · {project.waitingDays} d</span> : null}
      {project.pastUsualDays !== null ? <PastUsualMark days={project.pastUsualDays} /> : null}
    </span>
  );
}

const FIRST_PAGE_URL = `/api/v1/projects?${new URLSearchParams(FIRST_LIST_PAGE)}`;

export function ProjectsTable({
  canCreate,
  canExport = false,
  firstPage,
}: {
  canCreate: boolean;
  canExport?: boolean;
  /** The opening page, rendered by the server; later pages, sorts and searches load from the API. */
  firstPage?: ProjectListPage;
}) {
  const [search, setSearch] = useState("");
  const [q, setQ] = useState("");
  const [stage, setStage] = useState("");
  const [waiting, setWaiting] = useState("");
  const [hold, setHold] = useState("");
  const [page, setPage] = useState(1);
  const [sorting, setSorting] = useState<SortingState>([{ id: "number", desc: true }]);

  // Ask the server only once typing pauses.
  useEffect(() => {
    const timer = setTimeout(() => {
      setQ(search.trim());
      setPage(1);
    }, 250);
    return () => clearTimeout(timer);
  }, [search]);

  const url = useMemo(() => {
    const params = new URLSearchParams({ page: String(page), pageSize: FIRST_LIST_PAGE.pageSize });
    if (q) params.set("q", q);
    if (stage) params.set("stage", stage);
    if (waiting) params.set("waitingOn", waiting);
    if (hold) params.set("hold", hold);
    if (sorting[0]) {
      params.set("sort", sorting[0].id);
      params.set("direction", sorting[0].desc ? "desc" : "asc");
    }
    return `/api/v1/projects?${params}`;
  }, [page, q, stage, waiting, hold, sorting]);

  const { data, error, isLoading } = useSWR(url, fetchJson, {
    keepPreviousData: true,
    fallbackData: url === FIRST_PAGE_URL ? firstPage : undefined,
  });
  // The spreadsheet holds every project these filters keep, in this order, not only this page.
  const csvUrl = url.replace(/page=\d+&pageSize=\d+&?/, "format=csv&");

  // eslint-disable-next-line react-hooks/incompatible-library -- the table object is recreated each render and never memoized; nothing here relies on the compiler
  const table = useReactTable({
    data: data?.items ?? [],
    columns: COLUMNS,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    pageCount: data?.pageCount ?? 1,
    state: { sorting },
    onSortingChange: (updater) => {
      setSorting(updater);
      setPage(1);
    },
    enableSortingRemoval: false,
  });

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-[16rem] flex-1">
          <label className="label" htmlFor="project-search">
            Search
          </label>
          <input
            id="project-search"
            type="search"
            className="input"
            placeholder="Customer, address or utility account number"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
          />
        </div>
        <div>
          <label className="label" htmlFor="stage-filter">
            Stage
          </label>
          <select
            id="stage-filter"
            className="input"
            value={stage}
            onChange={(e) => {
              setStage(e.target.value);
              setPage(1);
            }}
          >
            <option value="">All stages</option>
            {STAGES.map((s) => (
              <option key={s} value={s}>
                {STAGE_LABELS[s]}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label className="label" htmlFor="waiting-filter">
            Waiting on
          </label>
          <select
            id="waiting-filter"
            className="input"
            value={waiting}
            onChange={(e) => {
              setWaiting(e.target.value);
              setPage(1);
            }}
          >
            <option value="">Anyone</option>
            {WAITING_PARTIES.map((w) => (
              <option key={w} value={w}>
                {WAITING_PARTY_LABELS[w]}
              </option>
            ))}
            <option value="nobody">Nobody</option>
          </select>
        </div>
        <div>
          <label className="label" htmlFor="hold-filter">
            Projects
          </label>
          <select
            id="hold-filter"
            className="input"
            value={hold}
            onChange={(e) => {
              setHold(e.target.value);
              setPage(1);
            }}
          >
            <option value="">All</option>
            <option value="active">Active</option>
            <option value="on_hold">On hold</option>
            <option value="cancelled">Cancelled</option>
          </select>
        </div>
        {canExport ? (
          <a href={csvUrl} download className="py-2 text-sm">
            Download CSV
          </a>
        ) : null}
        {canCreate ? (
          <Link
            href="/projects/new"
            className="rounded bg-copper px-4 py-2 text-sm font-medium text-white no-underline hover:bg-copper-dark hover:no-underline"
          >
            New project
          </Link>
        ) : null}
      </div>

      {error ? (
        <p role="alert" className="text-sm text-result-fail">
          {error.message}
        </p>
      ) : null}

      {/* Phones get cards; the table needs a wider screen. */}
      <ul className="space-y-2 sm:hidden">
        {(data?.items ?? []).map((p) => (
          <li key={p.id} className="panel space-y-1 p-3" data-testid="project-card">
            <div className="flex items-baseline justify-between gap-2">
              <Link href={`/projects/${p.id}`} className="font-medium">
                {p.customerName}
              </Link>
              <span className="measure text-xs text-ink-faint">No. {p.number}</span>
            </div>
            <p className="text-sm text-ink-soft">
              {p.street}, {p.city}
            </p>
            <div className="flex items-center justify-between gap-2">
              <StageBadge stage={p.stage} />
              {p.holdState ? <HoldMark state={p.holdState} /> : null}
              <span className="measure text-xs text-ink-faint">{p.daysInStage} d</span>
            </div>
            <p className="text-xs text-ink-soft">
              Waiting on <WaitingOn project={p} />
            </p>
            <p className="text-xs text-ink-faint">{p.nextAction}</p>
            {/* On site the crew goes straight to the readings and uploads. */}
            {stageIndex(p.stage) >= stageIndex("permit_issued") ? (
              <Link href={`/projects/${p.id}/field`} className="inline-block pt-1 text-sm">
                Field record
              </Link>
            ) : null}
          </li>
        ))}
      </ul>

      <div className="hidden overflow-x-auto rounded-md border border-paper-edge bg-white/70 sm:block">
        <table className="w-full text-left text-sm" aria-busy={isLoading}>
          <thead className="border-b border-paper-edge bg-paper-deep/70 text-xs uppercase tracking-wide text-ink-soft">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      className="px-3 py-2 font-medium"
                      aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined}
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          className="inline-flex items-center gap-1 uppercase"
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden className="text-copper">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}
                          </span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-paper-edge/70 last:border-0 hover:bg-paper/60" data-testid="project-row">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {data && data.items.length === 0 ? (
              <tr>
                <td colSpan={COLUMNS.length} className="px-3 py-8 text-center text-ink-faint">
                  No project matches.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>

      <div className="flex items-center justify-between text-sm text-ink-soft">
        <span>{data ? `${data.total} project${data.total === 1 ? "" : "s"}` : isLoading ? "Loading…" : ""}</span>
        <div className="flex items-center gap-2">
          <button
            type="button"
            className="rounded border border-paper-edge bg-white px-3 py-1 disabled:opacity-40"
            disabled={page <= 1}
            onClick={() => setPage((p) => p - 1)}
          >
            Previous
          </button>
          <span className="measure">
            {data?.page ?? page} / {data?.pageCount ?? 1}
          </span>
          <button
            type="button"
            className="rounded border border-paper-edge bg-white px-3 py-1 disabled:opacity-40"
            disabled={!data || page >= data.pageCount}
            onClick={() => setPage((p) => p + 1)}
          >
            Next
          </button>
        </div>
      </div>
    </div>
  );
}
