import type { Metadata } from "next";
import { requirePermission } from "@/lib/server/auth";
import { ImportWizard } from "./_components/import-wizard";
import { importProjectsAction, previewProjectImportAction } from "./actions";

export const metadata: Metadata = { title: "Import projects" };

export default async function ImportProjectsPage() {
  await requirePermission("projects:import");
  return (
    <div className="mx-auto max-w-4xl space-y-4">
      <div>
        <h1>Import projects from a spreadsheet</h1>
        <p className="text-sm text-ink-soft">
          Bring in the projects your company already keeps in a spreadsheet: customer, address, utility account and meter numbers, AHJ,
          utility, coordinator, installer and service ratings. Each row is checked as the project form checks it; rows with a problem are
          named and left out, and a project already in Ohmstead (same utility account number and address) is not added twice.
        </p>
      </div>
      <ImportWizard preview={previewProjectImportAction} run={importProjectsAction} />
    </div>
  );
}
