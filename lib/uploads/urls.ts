export const imageVariants = ["original", "1600", "400"] as const;
export type ImageVariant = (typeof imageVariants)[number];

/** Where the app serves a stored photo (always through the authenticated route, never as a static file). */
export function imageUrl(imageId: string, variant: ImageVariant): string {
  return `/api/uploads/${encodeURIComponent(imageId)}/${variant}`;
}
