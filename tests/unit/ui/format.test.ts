import { describe, expect, it } from "vitest";
import { formatFigure } from "@/components/ui/figure";
import { formatMoney } from "@/components/ui/money";
import { lrvText, normaliseHex, swatchLabel } from "@/components/ui/swatch-format";

describe("formatMoney", () => {
  it("formats cents as Australian dollars", () => {
    expect(formatMoney(123450)).toBe("$1,234.50");
    expect(formatMoney(0)).toBe("$0.00");
  });
  it("signs differences with + and a true minus", () => {
    expect(formatMoney(12000, { signed: true })).toBe("+$120.00");
    expect(formatMoney(-8000, { signed: true })).toBe("\u2212$80.00");
    expect(formatMoney(-8000)).toBe("\u2212$80.00");
    expect(formatMoney(0, { signed: true })).toBe("$0.00");
  });
});

describe("formatFigure", () => {
  it("fixes the decimals so columns align", () => {
    expect(formatFigure(2.31, 1)).toBe("2.3");
    expect(formatFigure(4.6, 2)).toBe("4.60");
    expect(formatFigure(1234, 0)).toBe("1,234");
  });
  it("never shows a negative zero", () => {
    expect(formatFigure(-0.04, 1)).toBe("0.0");
    expect(formatFigure(-0.4, 1)).toBe("\u22120.4");
    expect(formatFigure(0.4, 1, true)).toBe("+0.4");
  });
});

describe("swatch helpers", () => {
  it("accepts only hex colours", () => {
    expect(normaliseHex("#ABC")).toBe("#aabbcc");
    expect(normaliseHex("b89f83")).toBe("#b89f83");
    expect(normaliseHex("red")).toBeNull();
    expect(normaliseHex("#b89f83;background:url(x)")).toBeNull();
  });
  it("says where an LRV came from", () => {
    expect(lrvText(62, "published")).toBe("LRV 62 (published)");
    expect(lrvText(38.5, "photo")).toBe("LRV 38.5 (from photo)");
    expect(lrvText(null, "computed")).toBeNull();
  });
  it("labels the colour area for screen readers", () => {
    expect(swatchLabel("Warm Limestone", 62, true)).toBe("Colour sample of Warm Limestone, LRV 62");
    expect(swatchLabel("Warm Limestone", null, false)).toBe("No colour recorded for Warm Limestone");
  });
});
