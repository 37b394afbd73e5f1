import { formatEmailDate, renderEmail, toOneLine } from "./layout";
import type { EmailContent } from "./layout";

const pluralize = (count: number, singular: string, plural: string) => `${count} ${count === 1 ? singular : plural}`;

/** One of the supplier's lines, as the "revision issued" e-mail lists it (never a price). */
export type IssuedLineSummary = {
  where: string;
  item: string;
  finishName: string;
  surfaceFormat: string | null;
  productCode: string | null;
  quantity: string;
  orderByDate: string | null;
};

const MAX_LISTED_LINES = 25;

function describeIssuedLine(l: IssuedLineSummary): string {
  const finish = [l.finishName, l.surfaceFormat, l.productCode ? `code ${l.productCode}` : null].filter(Boolean).join(", ");
  const orderBy = l.orderByDate ? `order by ${formatEmailDate(`${l.orderByDate}T00:00:00Z`)}` : "order-by date not set yet";
  return `${l.where}: ${l.item}. ${finish}. ${l.quantity}; ${orderBy}.`;
}

export function revisionIssuedMessage(input: {
  url: string;
  projectName: string;
  letter: string;
  supplierName: string;
  lineCount: number;
  siteAddress?: string | null;
  installDate?: string | null;
  contact?: { name: string; studioName: string; email: string; phone: string | null } | null;
  lines?: IssuedLineSummary[];
}): EmailContent {
  const lines = input.lines ?? [];
  const site = input.siteAddress ? `Site: ${input.siteAddress}.` : "The site address isn’t set yet.";
  const install = input.installDate ? ` Install date: ${formatEmailDate(`${input.installDate}T00:00:00Z`)}.` : " The install date isn’t set yet.";
  const listed = lines.slice(0, MAX_LISTED_LINES).map(describeIssuedLine);
  const more = lines.length > MAX_LISTED_LINES ? [`…and ${lines.length - MAX_LISTED_LINES} more on the revision page.`] : [];
  const contact = input.contact
    ? [`Questions: ${input.contact.name} at ${input.contact.studioName}, ${input.contact.email}${input.contact.phone ? `, ${input.contact.phone}` : ""}.`]
    : [];
  return renderEmail({
    subject: `Revision ${toOneLine(input.letter)} issued for ${toOneLine(input.projectName)}`,
    heading: `Revision ${input.letter} for ${input.projectName}`,
    paragraphs: [
      `Revision ${input.letter} has been issued to ${input.supplierName} with ${pluralize(input.lineCount, "line", "lines")}.`,
      ...(input.lines ? [`${site}${install}`, ...listed, ...more] : []),
      ...contact,
      "Please look it over and acknowledge it once you’ve checked it. Photos of the finishes are on the revision page.",
    ],
    action: { label: `Review revision ${input.letter}`, url: input.url },
  });
}
