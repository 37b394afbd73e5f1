import { Money } from "@/components/ui";
import type { AllowanceComparison } from "@/lib/decisions/budget";

/** "$420.00 under the allowance" — the words carry the meaning; no colour is needed to read it. */
export function AllowanceDifference({ comparison, className }: { comparison: AllowanceComparison; className?: string }) {
  if (comparison.direction === "on") return <span className={className}>Exactly the allowance</span>;
  return (
    <span className={className}>
      <Money cents={Math.abs(comparison.differenceCents)} /> {comparison.direction} the allowance
    </span>
  );
}
