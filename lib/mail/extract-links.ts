const TEXT_URL = /https?:\/\/[^\s<>"'`]+/gi;
const HREF = /\bhref\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'>]+))/gi;
const NAMED_ENTITIES: Record<string, string> = {
  amp: "&",
  lt: "<",
  gt: ">",
  quot: '"',
  apos: "'",
  nbsp: "\u00a0",
};

/** Decodes the HTML entities that realistically appear inside an attribute value. */
export function decodeHtmlEntities(value: string): string {
  return value.replace(/&(#x[0-9a-f]+|#[0-9]+|[a-z]+);/gi, (entity, body: string) => {
    if (body.startsWith("#")) {
      const hex = body[1] === "x" || body[1] === "X";
      const code = Number.parseInt(body.slice(hex ? 2 : 1), hex ? 16 : 10);
      return Number.isInteger(code) && code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : entity;
    }
    return NAMED_ENTITIES[body.toLowerCase()] ?? entity;
  });
}

function countOf(value: string, char: string): number {
  return value.split(char).length - 1;
}

// Prose puts punctuation right after a URL ("open https://x.example/a."), and converted HTML
// wraps links as "label [url]"; neither character belongs to the URL unless it is balanced.
function trimTrailingPunctuation(url: string): string {
  let result = url;
  for (;;) {
    const last = result.at(-1);
    if (last === undefined) return result;
    const unbalanced =
      (last === ")" && countOf(result, "(") < countOf(result, ")")) ||
      (last === "]" && countOf(result, "[") < countOf(result, "]"));
    if (!".,;:!?".includes(last) && !unbalanced) return result;
    result = result.slice(0, -1);
  }
}

function isHttpUrl(value: string): boolean {
  return /^https?:\/\/\S+$/i.test(value);
}

/** Finds http(s) URLs in decoded plain text. */
export function findTextLinks(text: string): string[] {
  return [...text.matchAll(TEXT_URL)].map((match) => trimTrailingPunctuation(match[0]));
}

/** Finds http(s) href values in HTML, entity-decoded as a browser would follow them. */
export function findHtmlLinks(html: string): string[] {
  return [...html.matchAll(HREF)]
    .map((match) => decodeHtmlEntities((match[1] ?? match[2] ?? match[3] ?? "").trim()))
    .filter(isHttpUrl);
}

/** Text links first, then HTML links, each URL once, in the order found. */
export function extractLinks(text: string, html?: string): string[] {
  const all = [...findTextLinks(text), ...(html === undefined ? [] : findHtmlLinks(html))];
  return [...new Set(all)];
}
