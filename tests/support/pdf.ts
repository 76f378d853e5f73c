// A PDF's text as Debian's pdftotext (poppler-utils) reads it: the reference for what a reader sees.
import { execFile } from "node:child_process";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";

const run = promisify(execFile);

export async function pdftotext(pdf: Buffer, layout = true): Promise<string> {
  const dir = await mkdtemp(path.join(process.env.TMPDIR ?? tmpdir(), "pdftotext-"));
  try {
    const file = path.join(dir, "in.pdf");
    await writeFile(file, pdf);
    const { stdout } = await run("pdftotext", [...(layout ? ["-layout"] : []), "-enc", "UTF-8", file, "-"]);
    return stdout;
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}
