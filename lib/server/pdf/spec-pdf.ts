import "server-only";
// The spec as a PDF (pdfkit, its built-in Helvetica): what the build shop reads and the golfer keeps.
import PDFDocument from "pdfkit";
import type { SpecData } from "@/lib/compare/spec-data";
import { specLines } from "@/lib/compare/spec-lines";

/**
 * Text as the built-in Helvetica can set it: its WinAnsi encoding has ± and ° but no true minus
 * (U+2212), which would come out as two wrong bytes, so the PDF prints a hyphen-minus instead.
 */
export const pdfText = (text: string) => text.replace(/\u2212/g, "-");

export async function specPdf(spec: SpecData, options: { compress?: boolean } = {}): Promise<Buffer> {
  const doc = new PDFDocument({ size: "A4", margin: 50, compress: options.compress ?? true, info: { Title: `Putter spec — ${spec.golfer.name}`, Author: spec.studioName } });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  const lines = specLines(spec);
  doc.font("Helvetica-Bold").fontSize(18).text(pdfText(`Putter spec — ${spec.golfer.name}`));
  doc.font("Helvetica").fontSize(10).fillColor("#4B5863").text(pdfText(lines.subtitle)).moveDown();
  for (const section of lines.sections) {
    doc.fillColor("#0E1A24").font("Helvetica-Bold").fontSize(12).text(pdfText(section.title)).moveDown(0.3);
    doc.font("Helvetica").fontSize(10);
    for (const [label, value] of section.rows) doc.text(pdfText(`${label}: `), { continued: true }).font("Helvetica-Bold").text(pdfText(value)).font("Helvetica");
    doc.moveDown();
  }
  doc.fillColor("#4B5863").fontSize(8).text(pdfText(lines.footer));
  doc.end();
  return done;
}
