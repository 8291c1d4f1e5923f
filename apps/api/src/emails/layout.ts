import type { OutgoingEmail } from "../lib/mailer.ts";

const escapeHtml = (s: string) =>
  s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

/**
 * Every message is plain text plus a simple HTML twin, signed with the studio's name.
 * `paragraphs` are plain sentences; `action` becomes a link (and a bare URL in the text part).
 */
export function composeEmail(input: {
  template: string;
  to: string;
  studioName: string;
  subject: string;
  greeting: string;
  paragraphs: string[];
  action?: { label: string; url: string };
  footnote?: string;
}): OutgoingEmail {
  const text = [
    input.greeting,
    "",
    ...input.paragraphs.flatMap((p) => [p, ""]),
    ...(input.action ? [`${input.action.label}: ${input.action.url}`, ""] : []),
    ...(input.footnote ? [input.footnote, ""] : []),
    `— ${input.studioName}`,
  ].join("\n");
  const html = `<!doctype html><html><body style="margin:0;background:#f6f1e7;font-family:'Public Sans',Arial,sans-serif;color:#1d1b18">
<div style="max-width:560px;margin:0 auto;padding:32px 24px">
<p style="font-size:13px;letter-spacing:.08em;text-transform:uppercase;color:#9c4221;margin:0 0 24px">${escapeHtml(input.studioName)}</p>
<p>${escapeHtml(input.greeting)}</p>
${input.paragraphs.map((p) => `<p style="line-height:1.5">${escapeHtml(p)}</p>`).join("\n")}
${input.action ? `<p style="margin:28px 0"><a href="${escapeHtml(input.action.url)}" style="background:#9c4221;color:#fff;padding:10px 18px;border-radius:6px;text-decoration:none;font-weight:600">${escapeHtml(input.action.label)}</a></p>` : ""}
${input.footnote ? `<p style="font-size:13px;color:#5b554c">${escapeHtml(input.footnote)}</p>` : ""}
<p style="margin-top:32px;color:#5b554c">— ${escapeHtml(input.studioName)}</p>
</div></body></html>`;
  return { template: input.template, to: input.to, subject: input.subject, text, html };
}
