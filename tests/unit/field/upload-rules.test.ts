import { describe, expect, test } from "vitest";
import type { Stage } from "@/lib/domain/stages";
import { displayFileName, hasThumbnail, mayRemoveUpload, tooLargeMessage, MAX_UPLOAD_BYTES } from "@/lib/field/upload-rules";

test.each([
  ["Signed form.PDF", "application/pdf", "Signed form.pdf"],
  ["../../etc/passwd", "application/pdf", "passwd.pdf"],
  ["C:\\Users\\crew\\IMG_0042.jpeg", "image/png", "IMG_0042.png"], // the bytes decide the extension
  ["setup.exe.pdf", "application/pdf", "setup.exe.pdf"],
  ["<script>.png", "image/png", "script_.png"], // leading dots, spaces and underscores are trimmed
  [".hidden", "image/jpeg", "upload.jpg"],
  ["", "image/jpeg", "upload.jpg"],
])("display name of %j (%s) → %j", (original, mime, expected) => {
  expect(displayFileName(original, mime)).toBe(expected);
});

test("long names are cut to 120 characters before the extension", () => {
  expect(displayFileName(`${"a".repeat(300)}.pdf`, "application/pdf")).toBe(`${"a".repeat(120)}.pdf`);
});

test("the size message names the limit", () => {
  expect(tooLargeMessage(MAX_UPLOAD_BYTES + 5 * 1024 * 1024)).toBe("The file is 25.0 MB; files may be at most 20 MB.");
});

describe("who may remove an upload", () => {
  const ORG = "org-1";
  const person = (
    id: string,
    role: "admin" | "coordinator" | "installer",
    extra: { organizationId?: string; apiTokenId?: string } = {},
  ) => ({ id, role, organizationId: extra.organizationId ?? ORG, ...(extra.apiTokenId ? { apiTokenId: extra.apiTokenId } : {}) });
  const project = (stage: Stage = "installed") => ({ organizationId: ORG, installerId: "crew", stage });
  const CREW = person("crew", "installer");
  const OTHER_CREW = person("other-crew", "installer");
  const COORDINATOR = person("cora", "coordinator");
  const ADMIN = person("ada", "admin");
  const RIVAL_ADMIN = person("rex", "admin", { organizationId: "org-2" });
  const TOKEN = person("ada", "admin", { apiTokenId: "t-1" });

  test.each<[string, Parameters<typeof mayRemoveUpload>[0], Stage, string | null, boolean]>([
    ["the assigned installer, their own photo", CREW, "installed", "crew", true],
    ["the assigned installer, the office's photo", CREW, "installed", "cora", false],
    ["an installer not assigned, even their own earlier upload", OTHER_CREW, "installed", "other-crew", false],
    ["a coordinator, the crew's photo", COORDINATOR, "installed", "crew", true],
    ["an admin, a file whose uploader left", ADMIN, "commissioned", null, true],
    ["an admin of another organization", RIVAL_ADMIN, "installed", "crew", false],
    ["an API token, which only reads", TOKEN, "installed", "ada", false],
    ["the uploader on the draft project", CREW, "draft", "crew", true],
    ["the uploader once PTO is received", CREW, "pto_received", "crew", false],
    ["an admin once the project is closed", ADMIN, "closed", "ada", false],
  ])("%s → %s", (_, viewer, stage, uploadedById, allowed) => {
    expect(mayRemoveUpload(viewer, project(stage), { uploadedById })).toBe(allowed);
  });

  test("pictures have thumbnails, PDFs do not", () => {
    expect([hasThumbnail("image/jpeg"), hasThumbnail("image/png"), hasThumbnail("application/pdf")]).toEqual([true, true, false]);
  });
});
