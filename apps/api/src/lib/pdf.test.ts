import { describe, expect, it } from "vitest";
import { newPdfDocument, pdfToBuffer } from "./pdf.ts";
import { pdfText } from "../../../../tests/support/pdf-text.ts";

describe("PDF documents", () => {
  it("embed Public Sans and read back the text written in it", async () => {
    const doc = newPdfDocument({ size: "A4", title: "Check" });
    doc.fontSize(14).text("Lantern Static — £1,234.56");
    doc.font("bold").text("Balance due");
    const pdf = await pdfToBuffer(doc);
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    expect(pdf.toString("latin1")).toContain("PublicSans");
    const text = await pdfText(pdf);
    expect(text).toContain("Lantern Static — £1,234.56");
    expect(text).toContain("Balance due");
  });
});
