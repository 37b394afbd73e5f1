import type { FinishCategory } from "@/db/schema";

/**
 * The demo library: invented finishes with plausible colours and LRVs (typical ranges from
 * DOMAIN.md, [memory, demo data only]). No real brands or product codes.
 * `lrv` set = a published figure from the (invented) maker; absent = computed from the colour.
 */
export type DemoFinish = {
  key: string;
  name: string;
  category: FinishCategory;
  supplier: "stone" | "joinery" | "flooring" | "tiles" | "lighting" | "appliances" | null;
  code: string;
  surface: string;
  format: string;
  unit: string;
  price: number;
  leadDays: number;
  hex: string;
  lrv?: number;
  cautions?: string[];
  care?: string;
};

const stone = (key: string, name: string, code: string, surface: string, hex: string, price: number, extra: Partial<DemoFinish> = {}): DemoFinish => ({
  key, name, category: "stone", supplier: "stone", code, surface, format: "20 mm slab, 3200 × 1600", unit: "m²", price, leadDays: 21, hex, ...extra,
});

export const demoFinishes: DemoFinish[] = [
  stone("saltbush", "Saltbush Limestone", "RS-LM-204", "honed", "#d9d2c3", 68000, { lrv: 64, cautions: ["natural-stone-silica"], care: "Seal yearly; wipe spills promptly." }),
  stone("cloudline", "Cloudline Marble", "RS-MB-118", "polished", "#ecebe6", 92000, { lrv: 78, cautions: ["marble-etching", "natural-stone-silica"] }),
  stone("cloudline-honed", "Cloudline Marble", "RS-MB-119", "honed", "#e6e4de", 92000, { lrv: 74, cautions: ["marble-etching", "natural-stone-silica"] }),
  stone("basalt-night", "Night Basalt", "RS-BS-310", "leathered", "#3a3b3c", 74000, { lrv: 6, cautions: ["natural-stone-silica"] }),
  stone("quartzite-fog", "Fog Quartzite", "RS-QZ-221", "polished", "#c9c8c2", 110000, { cautions: ["natural-stone-silica"] }),
  stone("porcelain-chalk", "Chalk Porcelain Slab", "RS-PS-402", "matt", "#efede8", 59000, { lrv: 80, format: "12 mm slab, 3200 × 1600" }),
  stone("porcelain-graphite", "Graphite Porcelain Slab", "RS-PS-415", "matt", "#4b4b4a", 59000, { lrv: 9, format: "12 mm slab, 3200 × 1600" }),
  stone("composite-snow", "Snow Composite (engineered)", "RS-EC-101", "polished", "#f1f0ec", 48000, { lrv: 82, cautions: ["engineered-stone"] }),
  stone("travertine-sand", "Sand Travertine", "RS-TV-130", "honed, filled", "#cdb899", 71000, { cautions: ["marble-etching", "natural-stone-silica"] }),

  ...(
    [
      ["oat", "Oat Matt Polyurethane", "TJ-PU-011", "matt 10% gloss", "#e8e1d3", 48, undefined],
      ["chalk", "Chalk White Polyurethane", "TJ-PU-001", "matt 10% gloss", "#f2f0ea", 88, undefined],
      ["ink", "Ink Blue Polyurethane", "TJ-PU-077", "satin 25% gloss", "#2c3a4b", 5, undefined],
      ["sage", "Dry Sage Polyurethane", "TJ-PU-052", "matt 10% gloss", "#a7ad98", 40, undefined],
      ["clay", "Clay Polyurethane", "TJ-PU-064", "matt 10% gloss", "#b89f83", 37, undefined],
      ["oak-natural", "Natural Oak Veneer", "TJ-VN-201", "matt lacquer, crown cut", "#c9a77c", 40, undefined],
      ["oak-smoked", "Smoked Oak Veneer", "TJ-VN-214", "matt lacquer, quarter cut", "#6d5440", 12, undefined],
      ["walnut", "Walnut Veneer", "TJ-VN-230", "matt oil finish", "#5a4334", undefined, undefined],
      ["laminate-ash", "Pale Ash Laminate", "TJ-LM-305", "woodgrain texture", "#d8c7ad", undefined, undefined],
    ] as const
  ).map(([key, name, code, surface, hex, lrv]): DemoFinish => ({
    key: `cab-${key}`, name, category: "cabinetry", supplier: "joinery", code, surface, format: "18 mm MR MDF door", unit: "m²",
    price: 42000, leadDays: 56, hex, ...(lrv === undefined ? {} : { lrv }), cautions: ["child-safety"],
  })),

  ...(
    [
      ["oak-herringbone", "Light Oak Herringbone", "GF-EO-402", "matt lacquer", "#c8a983", 46, ["slip-wet-areas"]],
      ["oak-wide", "Wide Oak Board, Raw", "GF-EO-415", "natural oil", "#b99672", undefined, ["slip-wet-areas"]],
      ["spotted-gum", "Spotted Gum Strip", "GF-SG-101", "satin", "#8a6446", 18, ["slip-wet-areas"]],
      ["concrete-polished", "Polished Concrete Look", "GF-CN-020", "polished", "#9d9c98", 33, ["polished-floor", "slip-wet-areas"]],
      ["vinyl-ash", "Ash Plank Vinyl", "GF-VP-220", "embossed, R10", "#cbbca4", undefined, []],
      ["cork-natural", "Natural Cork Tile", "GF-CK-005", "matt seal", "#b48a5e", 28, []],
      ["terrazzo-mist", "Mist Terrazzo Tile", "GF-TZ-330", "honed, P3", "#d4d1ca", 60, ["slip-wet-areas"]],
    ] as const
  ).map(([key, name, code, surface, hex, lrv, caut]): DemoFinish => ({
    key: `floor-${key}`, name, category: "flooring", supplier: "flooring", code, surface, format: "per m² laid", unit: "m²",
    price: 16500, leadDays: 28, hex, ...(lrv === undefined ? {} : { lrv }), cautions: [...caut],
  })),

  ...(
    [
      ["zellige-white", "White Glazed Handmade", "KL-ZG-01", "gloss, uneven", "#eeeae0", 79, 100, []],
      ["zellige-green", "Deep Green Glazed Handmade", "KL-ZG-14", "gloss, uneven", "#2f5546", 9, 100, []],
      ["subway-clay", "Clay Subway 75 × 300", "KL-SB-22", "satin", "#c08d6c", undefined, 300, []],
      ["mosaic-grey", "Pebble Grey Mosaic", "KL-MS-40", "matt, P4", "#9b9a96", undefined, 25, ["slip-wet-areas"]],
      ["porcelain-600", "Limestone-look Porcelain 600 × 600", "KL-PC-60", "matt, P3", "#d6cfc1", 61, 600, ["slip-wet-areas"]],
      ["porcelain-polished", "Polished Ivory Porcelain 600 × 1200", "KL-PC-61", "polished, P1", "#ebe6da", 74, 1200, ["polished-floor", "slip-wet-areas"]],
      ["terracotta", "Terracotta Square", "KL-TC-10", "sealed", "#b1643f", 19, 200, ["slip-wet-areas"]],
      ["fingermosaic", "Finger Mosaic Sage", "KL-FM-05", "satin", "#9fa890", undefined, 20, []],
    ] as const
  ).map(([key, name, code, surface, hex, lrv, size, caut]): DemoFinish => ({
    key: `tile-${key}`, name, category: "tile", supplier: "tiles", code, surface, format: `${size} mm`, unit: "m²",
    price: 12900, leadDays: 35, hex, ...(lrv === undefined ? {} : { lrv }), cautions: [...caut],
  })),

  ...(
    [
      ["mixer-brass", "Gooseneck Mixer, Aged Brass", "KL-TP-301", "brushed brass", "#a6844f"],
      ["mixer-steel", "Gooseneck Mixer, Brushed Steel", "KL-TP-302", "brushed stainless", "#a9a9a6"],
      ["mixer-black", "Gooseneck Mixer, Matt Black", "KL-TP-303", "matt black", "#2a2a2a"],
      ["sink-steel", "Undermount Sink 760", "KL-SK-760", "brushed stainless", "#b4b4b1"],
      ["sink-fireclay", "Fireclay Butler Sink 600", "KL-SK-600", "gloss white", "#f3f2ee"],
      ["basin-mixer", "Basin Mixer, Aged Brass", "KL-TP-210", "brushed brass", "#a48350"],
    ] as const
  ).map(([key, name, code, surface, hex]): DemoFinish => ({
    key: `tap-${key}`, name, category: "tapware", supplier: "tiles", code, surface, format: "each", unit: "each",
    price: 68900, leadDays: 21, hex, cautions: ["plumbing-work"],
  })),

  ...(
    [
      ["pull-brass", "Knurled Pull 160, Aged Brass", "TJ-HW-160", "brushed brass", "#a27f49"],
      ["pull-black", "Bar Pull 192, Matt Black", "TJ-HW-192", "powder coat", "#262626"],
      ["knob-brass", "Round Knob 30, Aged Brass", "TJ-HW-030", "brushed brass", "#a88650"],
      ["edge-pull", "Edge Pull 250, Brushed Steel", "TJ-HW-250", "brushed stainless", "#a3a3a0"],
      ["hinge-soft", "Soft-close Hinge", "TJ-HW-SCH", "nickel", "#b7b7b5"],
      ["leather-pull", "Leather Tab Pull, Tan", "TJ-HW-LT1", "vegetable-tanned", "#9a6a3f"],
    ] as const
  ).map(([key, name, code, surface, hex]): DemoFinish => ({
    key: `hw-${key}`, name, category: "hardware", supplier: "joinery", code, surface, format: "each", unit: "each",
    price: 3400, leadDays: 14, hex, cautions: ["child-safety"],
  })),

  ...(
    [
      ["pendant-opal", "Opal Globe Pendant 300", "LR-PD-300", "opal glass", "#f1f0ea"],
      ["pendant-brass", "Dome Pendant, Brass", "LR-PD-210", "brushed brass", "#a98a55"],
      ["pendant-clay", "Ceramic Pendant, Clay", "LR-PD-118", "matt glaze", "#b38f73"],
      ["downlight", "Trimless Downlight 3000 K, CRI 95", "LR-DL-090", "white trim", "#f4f4f2"],
      ["strip", "LED Strip 2700 K, CRI 95", "LR-ST-027", "aluminium channel", "#c8c8c6"],
      ["wall-light", "Wall Sconce, Matt Black", "LR-WL-040", "powder coat", "#2b2b2b"],
    ] as const
  ).map(([key, name, code, surface, hex]): DemoFinish => ({
    key: `light-${key}`, name, category: "lighting", supplier: "lighting", code, surface, format: "each", unit: "each",
    price: 54000, leadDays: 42, hex, cautions: ["electrical-work"],
  })),

  ...(
    [
      ["induction-900", "Induction Cooktop 900", "HA-IN-900", "black glass", "#1f2021", ["induction-pacemaker", "electrical-work", "heat-near-cooktop"]],
      ["gas-900", "Gas Cooktop 900, 5 burners", "HA-GS-900", "stainless", "#b2b2af", ["gas-work", "heat-near-cooktop"]],
      ["oven-600", "Pyrolytic Oven 600", "HA-OV-600", "black glass, steel trim", "#2a2b2c", ["electrical-work"]],
      ["rangehood", "Integrated Rangehood 900", "HA-RH-900", "stainless", "#b0b0ad", ["heat-near-cooktop", "electrical-work"]],
      ["dishwasher", "Integrated Dishwasher 600", "HA-DW-600", "panel ready", "#d0d0cd", ["plumbing-work", "electrical-work"]],
    ] as const
  ).map(([key, name, code, surface, hex, caut]): DemoFinish => ({
    key: `app-${key}`, name, category: "appliances", supplier: "appliances", code, surface, format: "each", unit: "each",
    price: 289000, leadDays: 84, hex, cautions: [...caut],
  })),

  ...(
    [
      ["limewash", "Limewash Warm White", "MX-LW-01", "flat", "#efe9dc", 81],
      ["greige", "Soft Greige", "MX-AC-22", "low sheen", "#cfc7b9", 58],
      ["eucalypt", "Eucalypt Leaf", "MX-AC-47", "low sheen", "#8d998a", 31],
      ["charcoal", "Deep Charcoal", "MX-AC-90", "low sheen", "#3b3c3d", 7],
      ["ceiling-white", "Ceiling White", "MX-CW-00", "flat", "#f6f6f4", 88],
      ["terracotta-wash", "Terracotta Wash", "MX-AC-63", "matt", "#c07b5c", 25],
    ] as const
  ).map(([key, name, code, surface, hex, lrv]): DemoFinish => ({
    key: `paint-${key}`, name, category: "paint", supplier: null, code, surface, format: "4 L", unit: "L",
    price: 2200, leadDays: 3, hex, lrv,
  })),
];
