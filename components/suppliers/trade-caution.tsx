import { Notice } from "@/components/ui";
import { licensedTradeCaution } from "@/lib/suppliers/trades";

/** For electricians and plumbers: the house caution that this work is for licensed trades, and local codes apply. */
export function TradeCaution({ trade }: { trade: string }) {
  const caution = licensedTradeCaution(trade);
  if (!caution) return null;
  return (
    <Notice tone="caution" title={caution.title}>
      <p>{caution.text}</p>
      <p className="mt-1">{caution.guidance}</p>
    </Notice>
  );
}
