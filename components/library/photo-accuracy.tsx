import { Notice } from "@/components/ui";
import type { Measurement } from "@/lib/uploads/measured";

/**
 * How far the measurement may be from the real sample, in plain words. The figures come from the
 * server (lib/uploads/measured.ts, where their derivation is written down); a photo is never final.
 */
export function PhotoAccuracy({ measurement }: { measurement: Measurement }) {
  const { likelyError: e, corrected, cardReflectance } = measurement;
  return (
    <Notice tone="caution" title="Measured from a photo, not the sample">
      {corrected ? (
        <p>
          Cast and exposure corrected with your {cardReflectance}% card. Expect about ±{e.lrv} LRV and a colour difference of about ΔE00 {e.deltaE} from the
          real sample. Check it against the physical sample under the room&apos;s light before anything is approved.
        </p>
      ) : (
        <p>
          No card, so the camera chose the exposure and white balance: expect the LRV within about ±{e.lrv} and the colour off by ΔE00 {e.deltaE} or more.
          Box a grey or white card in the shot to correct both, and check against the physical sample before anything is approved.
        </p>
      )}
    </Notice>
  );
}
