/* eslint-disable @next/next/no-img-element -- the photo comes from an authenticated route; next/image would fetch it without the session */
type Props = { photo: { thumbUrl: string; url: string }; finishName: string };

/**
 * The finish's photo on the pale neutral surround (a photo, not the colour to order by), opening
 * the larger image. Served by the signed-in upload route, which checks the line is theirs.
 */
export function LinePhoto({ photo, finishName }: Props) {
  return (
    <a
      href={photo.url}
      target="_blank"
      rel="noopener"
      className="block w-24 shrink-0 rounded-chip bg-surround-light p-1.5 ring-1 ring-line"
      data-swatch-surround=""
      aria-label={`Open the photo of ${finishName}`}
    >
      <img src={photo.thumbUrl} alt={`Photo of ${finishName}`} loading="lazy" decoding="async" className="block aspect-square w-full object-cover" />
    </a>
  );
}
