import { formatMoney, type StudioDto } from "@takeup/domain";
import { composeEmail } from "./layout.ts";
import type { OutgoingEmail } from "../lib/mailer.ts";

/** Tells a client, a month ahead, which of its reels start to carry a monthly storage fee and when. */
export function storageNoticeEmail(p: { studio: StudioDto; to: string; name: string; reels: { labelId: string; feeStart: string }[]; monthlyFeeCents: number }): OutgoingEmail {
  const fee = formatMoney(p.monthlyFeeCents, p.studio.currency);
  return composeEmail({
    template: "storage_notice",
    to: p.to,
    studioName: p.studio.name,
    subject: `Storage fees start soon for ${p.reels.length === 1 ? "one of your reels" : `${p.reels.length} of your reels`}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      `We keep your reels in our vault free of charge for a while after your project's last session. From the dates below each reel carries a storage fee of ${fee} a month.`,
      ...p.reels.map((r) => `${r.labelId}: fees from ${r.feeStart}.`),
      "If you would like to collect a reel before then, reply to this message and we will have it ready.",
    ],
  });
}
