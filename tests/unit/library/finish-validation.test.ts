import { describe, expect, it } from "vitest";
import { lightReflectance, parseColour } from "@/lib/colour";
import { finishInputSchema, finishListQuerySchema, finishPatchSchema } from "@/lib/validation/finish";
import { lightnessForLrv, settleColour } from "@/lib/validation/finish-colour";

const base = {
  name: "Saltbush Limestone",
  category: "stone",
  unit: "m²",
  unitPriceCents: 68000,
  leadTimeDays: 21,
  colour: { source: "published", value: "#d9d2c3" },
};

describe("finishInputSchema", () => {
  it("takes a finish with a published hex colour and fills the optional fields", () => {
    const parsed = finishInputSchema.parse(base);
    expect(parsed).toMatchObject({ supplierId: null, productCode: null, cautions: [], imageId: null });
    expect(parsed.lrv).toBeUndefined();
  });

  it("names each bad field in plain words", () => {
    const result = finishInputSchema.safeParse({ ...base, name: " ", unitPriceCents: -1, leadTimeDays: 1.5, colour: { source: "published", value: "beige" }, cautions: ["made-up"] });
    expect(result.success).toBe(false);
    const paths = result.error?.issues.map((i) => i.path.join(".")).sort();
    expect(paths).toEqual(["cautions.0", "colour.value", "leadTimeDays", "name", "unitPriceCents"]);
    expect(result.error?.issues.find((i) => i.path.join(".") === "colour.value")?.message).toMatch(/#RRGGBB/);
  });

  it("needs the LRV when the colour is to come from it, and a photo when measured from one", () => {
    const lrvOnly = finishInputSchema.safeParse({ ...base, colour: { source: "computed" } });
    expect(lrvOnly.error?.issues.map((i) => i.path.join("."))).toEqual(["lrv"]);
    const photo = finishInputSchema.safeParse({ ...base, colour: { source: "photo", lab: [80, 1, 5] } });
    expect(photo.error?.issues.map((i) => i.path.join("."))).toEqual(["imageId"]);
  });

  it("refuses an LRV outside 0–100 [published: BS 8493 LRV scale, as quoted in DOMAIN.md]", () => {
    expect(finishInputSchema.safeParse({ ...base, lrv: 101 }).success).toBe(false);
    expect(finishInputSchema.safeParse({ ...base, lrv: -1 }).success).toBe(false);
  });
});

describe("finishPatchSchema", () => {
  it("leaves out what the patch leaves out (no default cautions wiping the list)", () => {
    expect(finishPatchSchema.parse({ archived: true })).toEqual({ archived: true });
    expect(finishPatchSchema.parse({ lrv: null })).toEqual({ lrv: null });
  });
});

describe("finishListQuerySchema", () => {
  it("treats empty parameters as not given and coerces numbers", () => {
    expect(finishListQuerySchema.parse({ q: "", category: "", page: "3", supplier: "" })).toEqual({
      q: "", page: 3, pageSize: 50, sort: "name", dir: "asc", status: "current",
    });
    expect(finishListQuerySchema.safeParse({ category: "marble" }).success).toBe(false);
    expect(finishListQuerySchema.safeParse({ pageSize: "500" }).success).toBe(false);
  });
});

describe("settleColour", () => {
  const limestone = parseColour("#d9d2c3");

  it("keeps a published LRV over the one computed from the colour [PRODUCT.md: a published LRV wins]", () => {
    expect(settleColour({ source: "published", value: "#d9d2c3" }, 64)).toMatchObject({ lrv: 64, lrvSource: "published", colourSource: "published" });
  });

  it("computes the LRV as CIE Y × 100 when none is published, marked by where the colour came from", () => {
    const computed = settleColour({ source: "published", value: "#d9d2c3" }, null);
    expect(computed?.lrvSource).toBe("computed");
    expect(computed?.lrv).toBeCloseTo(lightReflectance(limestone), 1);
    expect(settleColour({ source: "photo", lab: limestone }, null)?.lrvSource).toBe("photo");
  });

  it("makes an LRV-only colour a neutral grey of exactly that LRV [published: CIE 15:2004 L* from Y]", () => {
    const grey = settleColour({ source: "computed" }, 20);
    expect(grey?.lab[1]).toBe(0);
    expect(grey?.lab[2]).toBe(0);
    // Y = 0.20 → L* = 116 × 0.2^(1/3) − 16 = 51.8372 (CIE L* definition, worked by hand).
    expect(grey?.lab[0]).toBeCloseTo(51.8372, 3);
    expect(lightReflectance(grey?.lab ?? [0, 0, 0])).toBeCloseTo(20, 6);
    expect(settleColour({ source: "computed" }, null)).toBeNull();
  });

  it("uses the linear part of L* below Y = 216/24389 [published: CIE 15:2004]", () => {
    expect(lightnessForLrv(0.5)).toBeCloseTo((24389 / 27) * 0.005, 6);
    expect(lightnessForLrv(100)).toBeCloseTo(100, 9);
  });
});
