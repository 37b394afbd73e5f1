/** Shown next to any on-screen swatch: screens and photos are never the basis for approving a finish. */
export const SCREEN_COLOUR_CAUTION =
  "Colour on a screen or in a photo is not the finish. Approve from physical samples under the room's own light.";
