/**
 * One line of a specification as it is frozen into a revision. Exactly these fields are
 * serialised (see revision-content.ts); anything else a screen shows is worked out from them.
 * Lines never carry prices: a supplier may see every field here.
 */
export type SpecLineContent = {
  /** `decision:<decisionId>` (`:2`, `:3`… for further lines of the option) or `fixed:<fixedItemId>`. */
  lineKey: string;
  room: string;
  item: string;
  location: string | null;
  finishId: string | null;
  finishName: string;
  supplierId: string | null;
  supplierName: string | null;
  productCode: string | null;
  quantity: number;
  unit: string;
  leadTimeDays: number;
  /** YYYY-MM-DD: the install date minus the lead time; null while the project has no install date. */
  orderByDate: string | null;
  /** Keys into lib/cautions.ts. */
  cautions: string[];
  sortOrder: number;
};

/** The fields compared line by line between revisions (sortOrder is layout, not content). */
export const comparedFields = [
  "room",
  "item",
  "location",
  "finishName",
  "productCode",
  "supplierName",
  "quantity",
  "unit",
  "leadTimeDays",
  "orderByDate",
  "cautions",
  "finishId",
  "supplierId",
] as const satisfies readonly (keyof SpecLineContent)[];

export type ComparedField = (typeof comparedFields)[number];
