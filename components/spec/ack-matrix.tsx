import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { formatShortDay } from "@/lib/spec/format";

type Revision = { id: string; letter: string };
type Supplier = { supplierId: string; supplierName: string; revisionIds: string[]; acknowledged: { revisionId: string; acknowledgedAt: Date }[] };

/** Revisions down, suppliers across: who acknowledged which revision, and when. */
export function AckMatrix({ revisions, suppliers }: { revisions: Revision[]; suppliers: Supplier[] }) {
  return (
    <Table caption="Acknowledgements by revision and supplier" captionHidden>
      <THead>
        <tr>
          <Th>Revision</Th>
          {suppliers.map((s) => (
            <Th key={s.supplierId}>{s.supplierName}</Th>
          ))}
        </tr>
      </THead>
      <TBody>
        {[...revisions].reverse().map((r, index) => (
          <Tr key={r.id}>
            <Th scope="row" className="text-ink">
              {r.letter}
            </Th>
            {suppliers.map((s) => {
              const ack = s.acknowledged.find((a) => a.revisionId === r.id);
              const hasLines = s.revisionIds.includes(r.id);
              return (
                <Td key={s.supplierId} className="whitespace-nowrap">
                  {!hasLines ? (
                    <span className="text-ink-soft">No lines</span>
                  ) : ack ? (
                    <span className="text-ok-ink">Acknowledged {formatShortDay(ack.acknowledgedAt.toISOString().slice(0, 10))}</span>
                  ) : index === 0 ? (
                    <span className="font-medium text-caution-ink">Not acknowledged</span>
                  ) : (
                    // A replaced revision nobody acknowledged needs no chasing: the latest one does.
                    <span className="text-ink-soft">Not acknowledged</span>
                  )}
                </Td>
              );
            })}
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
