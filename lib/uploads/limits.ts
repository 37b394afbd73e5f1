/** The photo types we take: what browsers show and sharp reads safely. Never SVG (it can carry script). */
export const imageKinds = ["jpeg", "png", "webp", "avif"] as const;
export type ImageKind = (typeof imageKinds)[number];

export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
export const MAX_UPLOAD_MEGABYTES = 15;
/** sharp's limitInputPixels: a 50-megapixel photo decodes to about 200 MB of pixels, enough for any sample. */
export const MAX_PIXELS = 50_000_000;

export const mimeOf: Record<ImageKind, string> = {
  jpeg: "image/jpeg",
  png: "image/png",
  webp: "image/webp",
  avif: "image/avif",
};

export const extensionOf: Record<ImageKind, string> = { jpeg: "jpg", png: "png", webp: "webp", avif: "avif" };

/** What the sender may call each type (browsers differ for JPEG). */
export const declaredMimes: Record<string, ImageKind> = {
  "image/jpeg": "jpeg",
  "image/jpg": "jpeg",
  "image/pjpeg": "jpeg",
  "image/png": "png",
  "image/webp": "webp",
  "image/avif": "avif",
};

export const declaredExtensions: Record<string, ImageKind> = {
  jpg: "jpeg",
  jpeg: "jpeg",
  jfif: "jpeg",
  png: "png",
  webp: "webp",
  avif: "avif",
};

export const kindNames: Record<ImageKind, string> = { jpeg: "JPEG", png: "PNG", webp: "WebP", avif: "AVIF" };
