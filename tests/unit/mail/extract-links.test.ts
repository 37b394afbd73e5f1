import { describe, expect, it } from "vitest";
import { decodeHtmlEntities, extractLinks } from "@/lib/mail/extract-links";

describe("extractLinks", () => {
  it("takes http(s) URLs from text, trimming sentence punctuation", () => {
    const text = "Open https://a.example.com/x?y=1&z=2. Or (https://b.example.com/p_(q)) and [https://c.example.com/r]";
    expect(extractLinks(text)).toEqual([
      "https://a.example.com/x?y=1&z=2",
      "https://b.example.com/p_(q)",
      "https://c.example.com/r",
    ]);
  });

  it("decodes entities in hrefs, ignores other schemes and deduplicates in order", () => {
    const html = `<a href="https://a.example.com/?a=1&amp;b=2">x</a><a href='mailto:x@example.com'>m</a>
      <a href=https://c.example.com/&#x3D;>c</a><a href="https://a.example.com/?a=1&#38;b=2">again</a>`;
    expect(extractLinks("see https://c.example.com/=", html)).toEqual([
      "https://c.example.com/=",
      "https://a.example.com/?a=1&b=2",
    ]);
  });

  it("leaves unknown entities alone", () => {
    expect(decodeHtmlEntities("&amp;&bogus;&#0;&quot;")).toBe('&&bogus;&#0;"');
  });
});
