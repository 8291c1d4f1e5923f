import QRCode from "qrcode";
import { noiseReductions, reelStatusLabels, type ReelDetailDto } from "@takeup/domain";
import { newPdfDocument, pdfToBuffer } from "../../lib/pdf.ts";

const widths: Record<number, string> = { 250: "1/4-inch", 500: "1/2-inch", 1000: "1-inch", 2000: "2-inch" };
export const reelFormat = (r: Pick<ReelDetailDto, "trackCount" | "tapeWidthMils" | "speedIps">) =>
  `${r.trackCount} tracks on ${widths[r.tapeWidthMils] ?? `${r.tapeWidthMils / 1000}-inch`} tape at ${r.speedIps} in/s`;
const noiseReductionText: Record<(typeof noiseReductions)[number], string> = { none: "None", encoded: "Encoded (decode on playback)" };

/** The box label (with a QR code of the label id) and the track sheet, on one page. */
export async function reelLabelPdf(reel: ReelDetailDto, studioName: string): Promise<Buffer> {
  const doc = newPdfDocument({ size: "A4", title: `Reel ${reel.labelId}` });
  const qr = await QRCode.toBuffer(reel.labelId, { type: "png", margin: 1, width: 240, errorCorrectionLevel: "M" });
  const left = doc.page.margins.left;
  const top = doc.page.margins.top;

  // The box label: a ruled box to cut out and stick on the tape box.
  doc.rect(left, top, 495, 190).lineWidth(1).stroke("#1d1b18");
  doc.image(qr, left + 12, top + 12, { width: 120 });
  doc.font("bold").fontSize(22).text(reel.labelId, left + 150, top + 14, { width: 330 });
  doc.font("body").fontSize(11).text(studioName, left + 150, top + 44, { width: 330 });
  const lines = [
    `Client: ${reel.clientName}`,
    `Project: ${reel.projectName ?? "—"}`,
    `Format: ${reelFormat(reel)}`,
    `Noise reduction: ${noiseReductionText[reel.noiseReduction]}`,
    `Reference level: ${reel.referenceLevel ?? "—"}`,
    `Recorded: ${reel.recordedOn ?? "—"}   Shelf: ${reel.shelf ?? "—"}`,
  ];
  doc.fontSize(10).text(lines.join("\n"), left + 150, top + 66, { width: 330, lineGap: 2 });
  doc.fontSize(9).fillColor("#5b554c").text(reelStatusLabels[reel.status], left + 12, top + 140, { width: 120, align: "center" });
  doc.fillColor("#1d1b18");
  if (reel.contentsNote) doc.fontSize(9).text(reel.contentsNote, left + 12, top + 160, { width: 470, height: 26, ellipsis: true });

  // The track sheet.
  let y = top + 215;
  doc.font("bold").fontSize(14).text("Track sheet", left, y);
  y += 24;
  const contents = new Map(reel.tracks.map((t) => [t.trackNo, t.contents]));
  const perColumn = Math.ceil(reel.trackCount / 2);
  doc.font("body").fontSize(10);
  for (let n = 1; n <= reel.trackCount; n++) {
    const column = n <= perColumn ? 0 : 1;
    const row = column === 0 ? n - 1 : n - 1 - perColumn;
    const x = left + column * 250;
    const rowY = y + row * 16;
    doc.font("bold").text(`Track ${n}`, x, rowY, { width: 55 });
    doc.font("body").text(contents.get(n) ?? "", x + 58, rowY, { width: 185, height: 14, ellipsis: true });
  }
  y += perColumn * 16 + 18;
  doc.font("bold").fontSize(14).text("Songs", left, y);
  y += 22;
  doc.fontSize(10);
  if (reel.songs.length === 0) doc.font("body").text("No songs entered yet.", left, y);
  for (const song of reel.songs) {
    doc.font("bold").text(song.start, left, y, { width: 50 });
    doc.font("body").text(song.title, left + 55, y, { width: 250, height: 14, ellipsis: true });
    doc.text(song.keptTakes ? `Kept: ${song.keptTakes}` : "", left + 310, y, { width: 185, height: 14, ellipsis: true });
    y += 16;
  }
  return pdfToBuffer(doc);
}
