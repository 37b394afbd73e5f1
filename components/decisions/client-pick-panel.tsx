"use client";

import { useState } from "react";
import { Button, Field, LinkButton, Money, Textarea } from "@/components/ui";
import type { DecisionView } from "@/lib/decisions/types";
import { AllowanceDifference } from "./allowance-difference";
import { PriceWithTax } from "./price-build";

type Props = { view: DecisionView; pending: boolean; onNote: (comment: string) => void };

/** Where the client stands: their current pick, a note for the designer, and the way to approve. */
export function ClientPickPanel({ view, pending, onNote }: Props) {
  const [note, setNote] = useState("");
  const current = view.currentChoice;
  const option = view.options.find((o) => o.id === current?.optionId);
  if (!current || !option) {
    return (
      <section aria-label="Your pick" className="rounded-lg border border-dashed border-line-strong bg-card p-4">
        <p className="font-medium">Nothing picked yet.</p>
        <p className="text-ink-soft">
          Compare the {view.options.filter((o) => !o.addedByVariation).length} options below and pick the one you like. Allowance for this item:{" "}
          <Money cents={view.allowanceCents} />.
        </p>
      </section>
    );
  }
  const who = current.by.id === view.viewer.id ? "You" : current.by.name;
  return (
    <section aria-label="Your pick" className="space-y-4 rounded-lg border border-line bg-card p-4 sm:p-5">
      <div>
        <p className="text-ink-soft">{who} picked</p>
        <p className="font-display text-xl font-semibold">{option.label}</p>
        <p>
          <PriceWithTax cents={option.priceCents} taxBasisPoints={view.taxBasisPoints} /> · <AllowanceDifference comparison={option.comparison} /> of <Money cents={view.allowanceCents} />
        </p>
      </div>
      <LinkButton href={`/client/decisions/${view.id}/approve/${option.id}`} size="lg" className="w-full sm:w-auto">
        Approve “{option.label}”…
      </LinkButton>
      <form
        className="space-y-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (note.trim()) onNote(note.trim());
          setNote("");
        }}
      >
        <Field label="A note for your designer" htmlFor="pick-note" optional hint="Sent with your pick, e.g. a question about the sample.">
          <Textarea id="pick-note" rows={2} value={note} maxLength={1000} onChange={(e) => setNote(e.target.value)} />
        </Field>
        <Button type="submit" variant="secondary" pending={pending} disabled={!note.trim()}>
          Send the note
        </Button>
      </form>
    </section>
  );
}
