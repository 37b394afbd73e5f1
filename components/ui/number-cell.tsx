import type { TdHTMLAttributes } from "react";
import type { FigureProps } from "./figure";
import { Figure } from "./figure";
import { Td } from "./table";

export type NumberCellProps = FigureProps & Omit<TdHTMLAttributes<HTMLTableCellElement>, "children" | "className">;

/** A right-aligned table cell holding one Figure: <NumberCell value={2.31} digits={1} unit="ΔE00" />. */
export function NumberCell({ value, digits, unit, unitFirst, signed, className, ...rest }: NumberCellProps) {
  return (
    <Td {...rest} numeric className={className}>
      <Figure value={value} digits={digits} unit={unit} unitFirst={unitFirst} signed={signed} />
    </Td>
  );
}
