// Sends local files to the object store, a few at a time.
import { readFile } from "node:fs/promises";
import { putObject } from "@/lib/server/storage";

/** `file` is read first; `movedTo`, where it may have been renamed meanwhile. */
export type FileUpload = { file: string; movedTo?: string; key: string; contentType: string };

async function readEither(item: FileUpload): Promise<Buffer> {
  try {
    return await readFile(item.file);
  } catch (err) {
    if (item.movedTo && (err as NodeJS.ErrnoException).code === "ENOENT") return readFile(item.movedTo);
    throw err;
  }
}

export async function uploadFiles(uploads: FileUpload[], concurrency = 8): Promise<void> {
  let next = 0;
  async function lane() {
    while (next < uploads.length) {
      const item = uploads[next++]!;
      await putObject(item.key, await readEither(item), item.contentType);
    }
  }
  await Promise.all(Array.from({ length: Math.min(concurrency, uploads.length) }, lane));
}
