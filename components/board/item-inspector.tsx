"use client";

import { useId, useState } from "react";
import { Button, Input, Swatch } from "@/components/ui";
import type { BoardChange } from "@/lib/boards/changes";
import { LABEL_SUGGESTIONS } from "@/lib/boards/labels";
import type { BoardItemView } from "@/lib/boards/types";
import { cautions, isCautionKey } from "@/lib/cautions";

type Props = { item: BoardItemView; order: string[]; onChange: (change: BoardChange) => void; onClose: () => void };

/** The selected swatch: where it goes, its place in the stack, and what to know about the finish. */
export function ItemInspector({ item, order, onChange, onClose }: Props) {
  const ids = useId();
  const [label, setLabel] = useState(item.label);
  const position = order.indexOf(item.id);
  const restack = (to: number) => {
    const next = order.filter((id) => id !== item.id);
    next.splice(to, 0, item.id);
    onChange({ kind: "reorder", itemIds: next });
  };
  const notes = item.finish.cautions.filter(isCautionKey).map((key) => cautions[key]);
  return (
    <section aria-labelledby={`${ids}-title`} className="flex flex-col gap-4 rounded-lg border border-line bg-card p-4 sm:flex-row">
      <Swatch
        hex={item.finish.hex}
        imageUrl={item.finish.imageUrl}
        name={item.finish.name}
        productCode={item.finish.productCode}
        lrv={item.finish.lrv}
        lrvSource={item.finish.lrvSource}
      />
      <div className="flex min-w-0 flex-1 flex-col gap-3">
        <h2 id={`${ids}-title`} className="text-lg font-semibold text-ink">
          Selected: {item.label}
        </h2>
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            const next = label.trim();
            if (next && next !== item.label) onChange({ kind: "relabel", itemId: item.id, label: next });
          }}
        >
          <label className="flex min-w-48 flex-1 flex-col gap-1.5">
            <span className="font-medium text-ink">Where it goes</span>
            <Input value={label} onChange={(e) => setLabel(e.target.value)} list={`${ids}-labels`} maxLength={60} name="label" />
          </label>
          <datalist id={`${ids}-labels`}>
            {LABEL_SUGGESTIONS.map((s) => (
              <option key={s} value={s} />
            ))}
          </datalist>
          <Button type="submit" variant="secondary">
            Save label
          </Button>
        </form>
        <p className="figures text-sm text-stone-600">
          At {item.x}, {item.y} · {item.width} × {item.height} on a 1200 × 800 board · layer {position + 1} of {order.length}
        </p>
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" disabled={position === order.length - 1} onClick={() => restack(order.length - 1)}>
            Bring to front
          </Button>
          <Button type="button" variant="secondary" disabled={position === 0} onClick={() => restack(0)}>
            Send to back
          </Button>
          <Button type="button" variant="danger" onClick={() => onChange({ kind: "remove", itemId: item.id })}>
            Remove from board
          </Button>
          <Button type="button" variant="quiet" onClick={onClose}>
            Done
          </Button>
        </div>
        {notes.map((note) => (
          <p key={note.title} className="text-sm text-ink-soft">
            <span className="font-semibold text-caution-ink">{note.title}.</span> {note.text}
          </p>
        ))}
      </div>
    </section>
  );
}
