import type { SpecLineContent } from "@/lib/spec/types";

/** Two invented lines in the shape a revision freezes (see db/seed/demo-revision.ts). */
export function sampleLines(): SpecLineContent[] {
  return [
    {
      lineKey: "decision:d-benchtop",
      room: "Kitchen",
      item: "Benchtop",
      location: "Perimeter and island",
      finishId: "f-limestone",
      finishName: "Saltbush Limestone",
      supplierId: "s-stone",
      supplierName: "Ridgeline Stoneworks",
      productCode: "RS-LM-204",
      quantity: 6.5,
      unit: "m²",
      leadTimeDays: 21,
      orderByDate: "2027-03-22",
      cautions: ["natural-stone-silica"],
      sortOrder: 0,
    },
    {
      lineKey: "fixed:x-cooktop",
      room: "Kitchen",
      item: "Cooktop",
      location: "Island",
      finishId: "f-induction",
      finishName: "Induction cooktop, 900",
      supplierId: "s-appliances",
      supplierName: "Hearthline Appliances",
      productCode: "HA-IND-90",
      quantity: 1,
      unit: "each",
      leadTimeDays: 84,
      orderByDate: "2027-01-18",
      cautions: ["electrical-work", "induction-pacemaker"],
      sortOrder: 1,
    },
  ];
}
