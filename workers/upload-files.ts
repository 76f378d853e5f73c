// Sends a set of local files to the object store, a few at a time.
import { readFile } from "node:fs/promises";
import { putObject } from "@/lib/server/storage";

export type FileUpload = { file: string; key: string; contentType: string };

export async function uploadFiles(uploads: FileUpload[], concurrency = 12): Promise<void> {
  let next = 0;
  async function lane() {
    while (next < uploads.length) {
      const item = uploads[next++]!;
      await putObject(item.key, await readFile(item.file), item.contentType);
    }
  }
  await Promise.all(Array.from({ length: Math.min(concurrency, uploads.length) }, lane));
}
