import { createHash, randomUUID } from "node:crypto";
import { PDFDocument, StandardFonts, rgb } from "pdf-lib";
import { CommissioningRecord, Project, ProjectFile } from "@/models";
import { putObject } from "@/lib/server/services/storage";

/** A one-page stand-in for a signed, scanned certificate of completion; marked as demo. */
export async function demoSignedFormPdf(project: {
  number: number;
  customerName: string;
  street: string;
  city: string;
}): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  pdf.setTitle(`Signed certificate of completion, project ${project.number} (demo)`);
  const page = pdf.addPage([612, 792]);
  const regular = await pdf.embedFont(StandardFonts.Helvetica);
  const script = await pdf.embedFont(StandardFonts.HelveticaOblique);
  const ink = rgb(0.12, 0.11, 0.09);
  page.drawText("Certificate of completion (signed copy)", { x: 48, y: 720, size: 18, font: regular, color: ink });
  page.drawText(`Project ${project.number} · ${project.customerName} · ${project.street}, ${project.city}`, {
    x: 48,
    y: 696,
    size: 11,
    font: regular,
    color: ink,
  });
  page.drawText("Demo scan for the Ohmstead demo data. Not a real document.", {
    x: 48,
    y: 672,
    size: 10,
    font: regular,
    color: rgb(0.6, 0.2, 0.1),
  });
  page.drawLine({ start: { x: 48, y: 560 }, end: { x: 300, y: 560 }, thickness: 0.8, color: ink });
  page.drawText("Installer's signature", { x: 48, y: 546, size: 9, font: regular, color: ink });
  page.drawText("signed on site", { x: 60, y: 566, size: 16, font: script, color: rgb(0.1, 0.2, 0.5) });
  return pdf.save();
}

/** Stores a signed form for every demo project whose commissioning is complete and has none yet. */
export async function attachDemoSignedForms() {
  for (const record of await CommissioningRecord.findAll({ where: { status: "complete" } })) {
    if (await ProjectFile.count({ where: { projectId: record.projectId, kind: "signed-completion" } })) continue;
    const project = await Project.findByPk(record.projectId);
    if (!project) continue;
    const bytes = await demoSignedFormPdf(project);
    const objectKey = `projects/${project.id}/field/${randomUUID()}.pdf`;
    await putObject({ key: objectKey, body: bytes, contentType: "application/pdf" });
    await ProjectFile.create({
      organizationId: project.organizationId,
      projectId: project.id,
      kind: "signed-completion",
      objectKey,
      fileName: `signed-certificate-project-${project.number}.pdf`,
      contentType: "application/pdf",
      sizeBytes: bytes.byteLength,
      sha256: createHash("sha256").update(bytes).digest("hex"),
      uploadedById: project.installerId,
    });
  }
}
