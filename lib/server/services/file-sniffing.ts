import "server-only";
import { fileTypeFromBuffer } from "file-type";

/** The file's type from its leading bytes (magic numbers), never from its name or the browser's claim. */
export async function sniffMimeType(bytes: Uint8Array): Promise<string | null> {
  const found = await fileTypeFromBuffer(bytes);
  return found?.mime ?? null;
}
