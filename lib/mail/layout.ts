export interface EmailContent {
  subject: string;
  text: string;
  html: string;
}

export interface EmailParts {
  subject: string;
  heading: string;
  paragraphs: string[];
  action: { label: string; url: string };
  /** Small print under the button, e.g. why the reader got this e-mail. */
  footnote?: string;
}

const WEEKDAYS = ["Sun", "Mon", "Tue", "Wed", "Thu", "Fri", "Sat"];
const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

// Neutral palette; ink on paper is ~15:1 and the button's white on ink ~14:1, well above AA.
const PAPER = "#f7f5f0";
const INK = "#1d1c1a";
const MUTED = "#55524c";
const FONT = "-apple-system, 'Segoe UI', Helvetica, Arial, sans-serif";

export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

/** Collapses newlines and runs of spaces so user-supplied names cannot reshape a subject line. */
export function toOneLine(value: string): string {
  return value.replace(/\s+/g, " ").trim();
}

/** Formats a date like "Fri 18 Dec 2026", in UTC so every recipient sees the same day. */
export function formatEmailDate(value: Date | string): string {
  const date = typeof value === "string" ? new Date(value) : value;
  if (Number.isNaN(date.getTime())) throw new Error(`formatEmailDate: invalid date ${String(value)}`);
  const weekday = WEEKDAYS[date.getUTCDay()] ?? "";
  const month = MONTHS[date.getUTCMonth()] ?? "";
  return `${weekday} ${date.getUTCDate()} ${month} ${date.getUTCFullYear()}`;
}

// A javascript: or data: link in an e-mail would be a phishing vector, whoever built the URL.
function assertHttpUrl(url: string): void {
  const protocol = URL.canParse(url) ? new URL(url).protocol : "";
  if (protocol !== "https:" && protocol !== "http:") {
    throw new Error(`E-mail links must be http(s) URLs, got ${JSON.stringify(url)}`);
  }
}

function renderText(parts: EmailParts): string {
  const lines = [parts.heading, "", ...parts.paragraphs.flatMap((p) => [p, ""])];
  lines.push(`${parts.action.label}:`, parts.action.url, "");
  if (parts.footnote) lines.push(parts.footnote, "");
  lines.push("— Mottle", "");
  return lines.join("\n");
}

function renderHtml(parts: EmailParts): string {
  const url = escapeHtml(parts.action.url);
  const paragraph = (text: string) =>
    `<p style="margin:0 0 16px;font-size:16px;line-height:1.5;color:${INK};">${escapeHtml(text)}</p>`;
  const small = (html: string) =>
    `<p style="margin:0 0 12px;font-size:14px;line-height:1.5;color:${MUTED};">${html}</p>`;
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(parts.subject)}</title>
</head>
<body style="margin:0;padding:0;background-color:${PAPER};">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="background-color:${PAPER};">
<tr><td align="center" style="padding:32px 16px;">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" border="0" style="max-width:560px;">
<tr><td style="font-family:${FONT};color:${INK};text-align:left;">
<h1 style="margin:0 0 20px;font-size:22px;line-height:1.3;font-weight:600;color:${INK};">${escapeHtml(parts.heading)}</h1>
${parts.paragraphs.map(paragraph).join("\n")}
<p style="margin:24px 0;"><a href="${url}" style="display:inline-block;padding:12px 22px;background-color:${INK};color:#ffffff;font-size:16px;font-weight:600;text-decoration:none;border-radius:6px;">${escapeHtml(parts.action.label)}</a></p>
${small(`If the button doesn’t work, copy this address into your browser:<br><span style="word-break:break-all;">${url}</span>`)}
${parts.footnote ? small(escapeHtml(parts.footnote)) : ""}
<p style="margin:24px 0 0;font-size:16px;line-height:1.5;color:${INK};">— Mottle</p>
</td></tr>
</table>
</td></tr>
</table>
</body>
</html>
`;
}

/** Renders the shared, deliberately plain layout: heading, a few sentences, one button. */
export function renderEmail(parts: EmailParts): EmailContent {
  assertHttpUrl(parts.action.url);
  const subject = toOneLine(parts.subject);
  return { subject, text: renderText(parts), html: renderHtml({ ...parts, subject }) };
}
