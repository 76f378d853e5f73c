import "server-only";
// The spec as a PDF (pdfkit): what the build shop reads and the golfer keeps. Set in DejaVu Sans,
// shipped in app/fonts and embedded (subset) in the file, so the true minus, °, ± and μ print as
// themselves on any reader. Each section is two columns — label, value — whose long values wrap
// inside their column; a row never starts at the foot of a page.
import { readFileSync } from "node:fs";
import path from "node:path";
import PDFDocument from "pdfkit";
import type { SpecData } from "@/lib/compare/spec-data";
import { specLines } from "@/lib/compare/spec-lines";

const FONT_DIR = path.join(process.cwd(), "app", "fonts");
let fonts: { regular: Buffer; bold: Buffer } | null = null;
const loadFonts = () => (fonts ??= { regular: readFileSync(path.join(FONT_DIR, "DejaVuSans.ttf")), bold: readFileSync(path.join(FONT_DIR, "DejaVuSans-Bold.ttf")) });

const INK = "#0E1A24", QUIET = "#4B5863";
const LABEL_WIDTH = 160, GAP = 12;

export async function specPdf(spec: SpecData, options: { compress?: boolean } = {}): Promise<Buffer> {
  const doc = new PDFDocument({ size: "A4", margin: 50, compress: options.compress ?? true, info: { Title: `Putter spec — ${spec.golfer.name}`, Author: spec.studioName } });
  const { regular, bold } = loadFonts();
  doc.registerFont("Body", regular);
  doc.registerFont("Bold", bold);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  const left = doc.page.margins.left;
  const width = doc.page.width - doc.page.margins.left - doc.page.margins.right;
  const valueX = left + LABEL_WIDTH + GAP;
  const valueWidth = width - LABEL_WIDTH - GAP;
  const bottom = () => doc.page.height - doc.page.margins.bottom;

  const lines = specLines(spec);
  doc.font("Bold").fontSize(10).fillColor(QUIET).text(spec.studioName, left, doc.y, { width });
  doc.font("Bold").fontSize(18).fillColor(INK).text(`Putter spec — ${spec.golfer.name}`, { width });
  doc.font("Body").fontSize(9).fillColor(QUIET).text(lines.subtitle, { width }).moveDown();
  for (const section of lines.sections) {
    if (doc.y + 40 > bottom()) doc.addPage();
    doc.font("Bold").fontSize(12).fillColor(INK).text(section.title, left, doc.y, { width }).moveDown(0.3);
    doc.fontSize(10);
    for (const [label, value] of section.rows) {
      const labelHeight = doc.font("Body").heightOfString(label, { width: LABEL_WIDTH });
      const valueHeight = doc.font("Bold").heightOfString(value, { width: valueWidth });
      if (doc.y + Math.max(labelHeight, valueHeight) > bottom()) doc.addPage();
      const y = doc.y;
      doc.font("Body").fillColor(QUIET).text(label, left, y, { width: LABEL_WIDTH });
      doc.font("Bold").fillColor(INK).text(value, valueX, y, { width: valueWidth });
      doc.y = y + Math.max(labelHeight, valueHeight) + 3;
    }
    doc.x = left;
    doc.moveDown();
  }
  doc.font("Body").fillColor(QUIET).fontSize(8).text(lines.footer, left, doc.y, { width });
  doc.end();
  return done;
}
