import { expect, test } from "vitest";
import { displayFileName, tooLargeMessage, MAX_UPLOAD_BYTES } from "@/lib/field/upload-rules";

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
