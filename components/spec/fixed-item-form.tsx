"use client";

import { useActionState, useState } from "react";
import { saveFixedItemAction } from "@/app/studio/projects/[projectId]/specification/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, describeField, Field, Input, LinkButton, Select, Textarea, useRefusedFocus } from "@/components/ui";
import { idle } from "@/lib/actions/result";

type Room = { id: string; name: string };
type FinishChoice = { id: string; name: string; category: string; productCode: string | null; unit: string; supplierName: string | null };
type Values = { roomId: string; finishId: string; item: string; location: string; quantity: string; unit: string; notes: string };

type Props = {
  projectId: string;
  fixedItemId: string | null;
  rooms: Room[];
  finishes: FinishChoice[];
  initial?: Partial<Values>;
  cancelHref: string;
};

const hints: Partial<Record<keyof Values, string>> = {
  item: "What it is, as the trades call it: Wall oven, Downlights, Floor.",
  finishId: "From your studio's library; it brings the supplier, product code, lead time and cautions.",
  location: "Where in the room: Island, Tall cabinets, Ceiling.",
};

const order = ["roomId", "item", "finishId", "location", "quantity", "unit", "notes"] as const satisfies readonly (keyof Values)[];

const categoryNames: Record<string, string> = {
  stone: "Stone and benchtops", cabinetry: "Cabinetry", flooring: "Flooring", tile: "Splashback and tile", tapware: "Tapware and sinks",
  hardware: "Hardware", lighting: "Lighting", appliances: "Appliances", paint: "Paint and walls",
};

/**
 * Adds or changes a fixed item; the ids travel in hidden inputs. Values are kept in state so a
 * refused save keeps what was typed; without JavaScript the page is drawn again from the values
 * the action sends back.
 */
export function FixedItemForm({ projectId, fixedItemId, rooms, finishes, initial, cancelHref }: Props) {
  const [state, action, pending] = useActionState(saveFixedItemAction, idle);
  const kept = state.ok ? undefined : state.values;
  const [values, setValues] = useState<Values>(() => ({ roomId: "", finishId: "", item: "", location: "", quantity: "", unit: "", notes: "", ...initial, ...pick(kept) }));
  const [unitTouched, setUnitTouched] = useState(Boolean(initial?.unit || kept?.unit));
  const { formRef, autoFocus } = useRefusedFocus(state, order);
  const errors = state.ok ? undefined : state.fieldErrors;
  const set = (key: keyof Values) => (e: { target: { value: string } }) => setValues((v) => ({ ...v, [key]: e.target.value }));
  const chooseFinish = (e: { target: { value: string } }) => {
    const finish = finishes.find((f) => f.id === e.target.value);
    setValues((v) => ({ ...v, finishId: e.target.value, unit: !unitTouched && finish ? finish.unit : v.unit }));
  };
  const categories = [...new Set(finishes.map((f) => f.category))];
  // Each control points at its own hint and error (aria-describedby), as Field lays them out.
  const wire = (id: string, key: keyof Values) => ({ ...describeField(id, { hint: hints[key], error: errors?.[key] }), autoFocus: autoFocus(key) });
  return (
    <form ref={formRef} action={action} noValidate className="flex max-w-xl flex-col gap-5">
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="fixedItemId" value={fixedItemId ?? ""} />
      <Field htmlFor="fixed-room" label="Room" error={errors?.roomId}>
        <Select name="roomId" value={values.roomId} onChange={set("roomId")} {...wire("fixed-room", "roomId")}>
          <option value="" disabled>Choose a room</option>
          {rooms.map((r) => <option key={r.id} value={r.id}>{r.name}</option>)}
        </Select>
      </Field>
      <Field htmlFor="fixed-item" label="Item" hint={hints.item} error={errors?.item}>
        <Input name="item" value={values.item} onChange={set("item")} autoComplete="off" {...wire("fixed-item", "item")} />
      </Field>
      <Field htmlFor="fixed-finish" label="Finish or product" hint={hints.finishId} error={errors?.finishId}>
        <Select name="finishId" value={values.finishId} onChange={chooseFinish} {...wire("fixed-finish", "finishId")}>
          <option value="" disabled>Choose from the library</option>
          {categories.map((c) => (
            <optgroup key={c} label={categoryNames[c] ?? c}>
              {finishes.filter((f) => f.category === c).map((f) => (
                <option key={f.id} value={f.id}>
                  {[f.name, f.productCode, f.supplierName].filter(Boolean).join(" · ")}
                </option>
              ))}
            </optgroup>
          ))}
        </Select>
      </Field>
      <Field htmlFor="fixed-location" label="Location" optional hint={hints.location} error={errors?.location}>
        <Input name="location" value={values.location} onChange={set("location")} autoComplete="off" {...wire("fixed-location", "location")} />
      </Field>
      <div className="grid grid-cols-2 gap-4">
        <Field htmlFor="fixed-quantity" label="Quantity" error={errors?.quantity}>
          <Input name="quantity" value={values.quantity} onChange={set("quantity")} inputMode="decimal" autoComplete="off" className="figures" {...wire("fixed-quantity", "quantity")} />
        </Field>
        <Field htmlFor="fixed-unit" label="Unit" error={errors?.unit}>
          <Input name="unit" value={values.unit} onChange={(e) => { setUnitTouched(true); set("unit")(e); }} autoComplete="off" {...wire("fixed-unit", "unit")} />
        </Field>
      </div>
      <Field htmlFor="fixed-notes" label="Notes" optional error={errors?.notes}>
        <Textarea name="notes" value={values.notes} onChange={set("notes")} rows={3} {...wire("fixed-notes", "notes")} />
      </Field>
      <FormMessage state={state} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={pending}>{fixedItemId ? "Save changes" : "Add to the specification"}</Button>
        <LinkButton href={cancelHref} variant="secondary">Cancel</LinkButton>
      </div>
    </form>
  );
}

/** The form's own fields out of the values a refused save sent back. */
function pick(kept: Record<string, string> | undefined): Partial<Values> {
  if (!kept) return {};
  return Object.fromEntries(order.filter((key) => key in kept).map((key) => [key, kept[key]]));
}
