import { describe, expect, it } from "vitest";
import { describeSurfaceFormat, describeWhere } from "@/lib/spec/line-detail";
import { revisionIssuedMessage } from "@/lib/mail/messages";

// How a supplier reads a finish and a line (common practice in the trade: surface, then format).
describe("a line as a supplier reads it", () => {
  it("puts the surface first, capitalised, then the format", () => {
    expect(describeSurfaceFormat({ surface: "honed", format: "20 mm slab" })).toBe("Honed, 20 mm slab");
    expect(describeSurfaceFormat({ surface: null, format: "600 × 600 mm" })).toBe("600 × 600 mm");
    expect(describeSurfaceFormat({ surface: " matt ", format: "  " })).toBe("Matt");
    expect(describeSurfaceFormat({ surface: null, format: null })).toBeNull();
  });

  it("says where: the room, and the location when it adds something", () => {
    expect(describeWhere({ room: "Kitchen", location: "Perimeter and island" })).toBe("Kitchen · Perimeter and island");
    expect(describeWhere({ room: "Laundry", location: "laundry" })).toBe("Laundry");
    expect(describeWhere({ room: "Ensuite", location: null })).toBe("Ensuite");
  });
});

describe("the revision issued e-mail", () => {
  const base = { url: "https://mottle.example.com/supplier/revisions/r1", projectName: "Hillside kitchen", letter: "B", supplierName: "Stone Co", lineCount: 1 };

  it("lists the site, install date, each line with its finish and order-by date, and the studio contact", () => {
    const message = revisionIssuedMessage({
      ...base,
      siteAddress: "3 Hill Road",
      installDate: "2027-04-12",
      contact: { name: "Rafe", studioName: "Fernleaf", email: "rafe@fernleaf.example", phone: "0400 000 000" },
      lines: [{ where: "Kitchen · Island", item: "Benchtop", finishName: "Limestone", surfaceFormat: "Honed, 20 mm slab", productCode: "LM-1", quantity: "6.5 m²", orderByDate: "2027-03-22" }],
    });
    expect(message.text).toContain("Site: 3 Hill Road. Install date: Mon 12 Apr 2027.");
    expect(message.text).toContain("Kitchen · Island: Benchtop. Limestone, Honed, 20 mm slab, code LM-1. 6.5 m²; order by Mon 22 Mar 2027.");
    expect(message.text).toContain("Questions: Rafe at Fernleaf, rafe@fernleaf.example, 0400 000 000.");
    expect(message.html).toContain("Honed, 20 mm slab");
  });

  it("says plainly what is not set yet, and escapes what people typed", () => {
    const message = revisionIssuedMessage({ ...base, siteAddress: null, installDate: null, contact: null, lines: [{ where: "<b>", item: "x", finishName: "y", surfaceFormat: null, productCode: null, quantity: "1 each", orderByDate: null }] });
    expect(message.text).toContain("The site address isn’t set yet. The install date isn’t set yet.");
    expect(message.text).toContain("order-by date not set yet");
    expect(message.html).not.toContain("<b>");
  });
});
