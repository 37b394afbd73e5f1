/** Plain names of the library's finish categories (db/schema/library.ts), for the board's picker. */
export const CATEGORY_WORDS: Record<string, string> = {
  stone: "Stone and benchtops",
  cabinetry: "Cabinetry",
  flooring: "Flooring",
  tile: "Splashback and tile",
  tapware: "Tapware and sinks",
  hardware: "Hardware",
  lighting: "Lighting",
  appliances: "Appliances",
  paint: "Paint and walls",
};

export const CATEGORY_OPTIONS = Object.entries(CATEGORY_WORDS).map(([value, label]) => ({ value, label }));
