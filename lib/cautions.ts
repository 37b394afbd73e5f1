/**
 * The one list of cautions a finish can carry, in plain words. Facts from ../shared/DOMAIN.md;
 * each defers to local codes and licensed trades, and none is a compliance statement.
 */
export const GUIDANCE_ONLY =
  "Guidance only. Confirm with current standards, the manufacturer's instructions and local regulations. Gas, electrical and plumbing work by licensed trades only.";

export const cautions = {
  "engineered-stone": {
    title: "Engineered stone and crystalline silica",
    text: "Engineered stone contains crystalline silica, which harms the lungs when cut. In Australia its manufacture, supply, processing and installation are prohibited from 1 July 2024. Check the rules where you build; porcelain and sintered stone under 1% crystalline silica are not covered.",
  },
  "natural-stone-silica": {
    title: "Cutting natural stone",
    text: "Natural stone can contain crystalline silica. Fabricators must use dust controls when cutting, and on-site cutting should be avoided.",
  },
  "slip-wet-areas": {
    title: "Slip resistance in wet areas",
    text: "Floors in kitchens, laundries and bathrooms get wet. Check the tile's wet pendulum slip rating: P2–P3 is a sensible minimum for a home kitchen, higher for bathrooms and outdoors.",
  },
  "polished-floor": {
    title: "Polished floor surfaces",
    text: "Polished and gloss floor surfaces are slippery when wet. Consider a honed or textured finish where floors get wet.",
  },
  "marble-etching": {
    title: "Marble etches",
    text: "Acids such as lemon juice, vinegar and wine etch marble at once, and sealers do not stop etching. Expect the surface to change with use.",
  },
  "heat-near-cooktop": {
    title: "Heat near cooktops",
    text: "Keep clearances around cooktops and rangehoods as the appliance manual and local gas and electrical rules require. Some surfaces discolour or crack with heat.",
  },
  "gas-work": {
    title: "Gas work",
    text: "Gas appliances are connected by a licensed gasfitter. Gas cooktop to rangehood: at least 650 mm (as quoted for AS/NZS 5601.1:2022), or the maker's figure if larger.",
  },
  "electrical-work": {
    title: "Electrical work",
    text: "Fixed wiring, lights and hard-wired appliances are installed by a licensed electrician, who issues a compliance certificate.",
  },
  "plumbing-work": {
    title: "Plumbing work",
    text: "Tapware, sinks and water-connected appliances are installed by a licensed plumber.",
  },
  "induction-pacemaker": {
    title: "Induction and pacemakers",
    text: "People with a pacemaker should keep about 60 cm from an induction cooktop and ask their cardiologist. The glass stays hot after use.",
  },
  "child-safety": {
    title: "Children in the home",
    text: "Consider soft-close hardware and locks on cupboards holding chemicals or knives.",
  },
} as const satisfies Record<string, { title: string; text: string }>;

export type CautionKey = keyof typeof cautions;
export const cautionKeys = Object.keys(cautions) as CautionKey[];

export function isCautionKey(value: string): value is CautionKey {
  return Object.hasOwn(cautions, value);
}
