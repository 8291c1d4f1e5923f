import { createRequire } from "node:module";
import PDFDocument from "pdfkit";

const require = createRequire(import.meta.url);

// pdfkit embeds the .woff files; the .woff2 files embed but render blank.
const fontFiles = {
  body: require.resolve("@fontsource/public-sans/files/public-sans-latin-400-normal.woff"),
  bold: require.resolve("@fontsource/public-sans/files/public-sans-latin-700-normal.woff"),
};

export type PaperSize = "A4" | "LETTER";

/** A new PDF with Public Sans registered as `body` and `bold` (and selected as `body`). */
export function newPdfDocument(options: { size: PaperSize; title: string; margin?: number }): PDFKit.PDFDocument {
  const doc = new PDFDocument({ size: options.size, margin: options.margin ?? 50, info: { Title: options.title, Creator: "Takeup" } });
  doc.registerFont("body", fontFiles.body);
  doc.registerFont("bold", fontFiles.bold);
  doc.font("body");
  return doc;
}

/** Ends the document and collects it into one buffer. */
export function pdfToBuffer(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    doc.end();
  });
}
