// Reads a PDF's text back with an independent reader (pdfjs), page by page, for tests.
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

/** The text of every page, each page's items joined by spaces and pages by newlines. */
export async function pdfText(pdf: Uint8Array): Promise<string> {
  const document = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false }).promise;
  const pages: string[] = [];
  for (let n = 1; n <= document.numPages; n += 1) {
    const content = await (await document.getPage(n)).getTextContent();
    pages.push(content.items.map((item) => ("str" in item ? item.str : "")).join(" "));
  }
  await document.destroy();
  return pages.join("\n");
}
