/** What every Plumbline e-mail says, before it is laid out. */
export type MailContent = {
  subject: string;
  /** The first line, as a heading. */
  heading: string;
  paragraphs: string[];
  /** One button (HTML) / link line (text) the reader is asked to follow. */
  action?: { label: string; url: string };
  /** Label–value lines (event, car, amount…), shown as a small table. */
  details?: Array<[label: string, value: string]>;
  /** Small print at the end (why they got it, how long a link works). */
  footnote?: string;
};

/**
 * The one layout every e-mail uses: a plain-text part that reads on its own and an HTML part
 * with the same words. Pure; every value is escaped in the HTML.
 */
export function renderMail(content: MailContent): { subject: string; text: string; html: string } {
  const text = [
    content.heading,
    "",
    ...content.paragraphs.flatMap((p) => [p, ""]),
    ...(content.details && content.details.length > 0
      ? [...content.details.map(([label, value]) => `${label}: ${value}`), ""]
      : []),
    ...(content.action ? [`${content.action.label}:`, content.action.url, ""] : []),
    ...(content.footnote ? [content.footnote, ""] : []),
    "— Plumbline",
  ].join("\n");
  const details =
    content.details && content.details.length > 0
      ? `<table role="presentation" style="border-collapse:collapse;margin:0 0 16px">${content.details
          .map(
            ([label, value]) =>
              `<tr><td style="padding:4px 16px 4px 0;color:#555;vertical-align:top">${escapeHtml(label)}</td><td style="padding:4px 0;font-weight:600">${escapeHtml(value)}</td></tr>`,
          )
          .join("")}</table>`
      : "";
  const action = content.action
    ? `<p style="margin:0 0 16px"><a href="${escapeHtml(content.action.url)}" style="display:inline-block;padding:14px 22px;background:#0b5c8e;color:#fff;text-decoration:none;border-radius:8px;font-weight:600">${escapeHtml(content.action.label)}</a></p>`
    : "";
  const html = `<!doctype html><html><body style="margin:0;padding:24px;background:#f4f4f2;font-family:sans-serif;font-size:17px;line-height:1.45;color:#111">
<div style="max-width:560px;margin:0 auto;background:#fff;border-radius:10px;padding:24px">
<p style="margin:0 0 8px;font-size:13px;letter-spacing:.08em;text-transform:uppercase;color:#0b5c8e;font-weight:700">Plumbline</p>
<h1 style="margin:0 0 16px;font-size:22px">${escapeHtml(content.heading)}</h1>
${content.paragraphs.map((p) => `<p style="margin:0 0 16px">${escapeHtml(p)}</p>`).join("\n")}
${details}${action}${content.footnote ? `<p style="margin:0;font-size:14px;color:#555">${escapeHtml(content.footnote)}</p>` : ""}
</div></body></html>`;
  return { subject: content.subject, text, html };
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}
