import { notFound } from "next/navigation";
import { isDevLike } from "@/lib/env";
import type { Metadata } from "next";
import {
  Badge,
  Button,
  Card,
  EmptyState,
  Field,
  Figure,
  Input,
  LinkButton,
  Logo,
  Money,
  Notice,
  NumberCell,
  PageHeader,
  Section,
  Select,
  Spinner,
  Swatch,
  Table,
  TBody,
  Td,
  TFoot,
  Th,
  THead,
  Tr,
  Textarea,
  VisuallyHidden,
  describeField,
  palette,
} from "@/components/ui";
import type { PaletteName } from "@/components/ui/palette";

// Temporary page for looking at the identity: every shared component in its states.
// Sample content is invented. Delete once real screens exist.

export const metadata: Metadata = { title: "Style check", robots: { index: false } };

// A photo stand-in made on the spot (no network here): SVG noise that reads like a honed stone.
function stonePhoto(base: string, vein: string): string {
  const svg = `<svg xmlns='http://www.w3.org/2000/svg' width='400' height='400'><filter id='n'><feTurbulence type='fractalNoise' baseFrequency='0.012 0.03' numOctaves='5' seed='7'/><feColorMatrix values='0 0 0 0 0  0 0 0 0 0  0 0 0 0 0  0 0 0 -1.6 1.1'/></filter><rect width='400' height='400' fill='${base}'/><rect width='400' height='400' fill='${vein}' filter='url(#n)' opacity='0.55'/></svg>`;
  return `data:image/svg+xml,${encodeURIComponent(svg)}`;
}

const finishes = [
  { hex: "#f4f1ea", name: "Saltbush Limestone", productCode: "SB-204", lrv: 82, lrvSource: "published" as const },
  { hex: "#b89f83", name: "Dune Oak, brushed", productCode: "DO-17", lrv: 38.5, lrvSource: "photo" as const },
  { hex: "#2b2d2f", name: "Basalt Night", productCode: null, lrv: 4, lrvSource: "computed" as const },
];

const paletteShown: PaletteName[] = [
  "ink", "inkSoft", "stone600", "lineStrong", "line", "paper", "card", "surround", "surroundLight",
  "spruce", "spruceDeep", "spruceWash", "ok", "okInk", "okWash", "caution", "cautionInk", "cautionWash",
  "problem", "problemInk", "problemWash", "info", "infoInk", "infoWash",
];

export default function StyleCheckPage() {
  // The living style guide: for people building Mottle, not part of the product in production.
  if (!isDevLike) notFound();
  const nameHint = "As the client will see it.";
  const nameError = "Give the board a name.";
  const codeErrors = ["A product code has letters, a dash and digits, e.g. SB-204.", "That code is already in your library."];
  return (
    <main id="main" className="mx-auto flex max-w-6xl flex-col gap-12 px-4 py-8 sm:px-8">
      <div className="flex flex-wrap items-center gap-8">
        <Logo />
        <Logo size="lg" />
      </div>

      <PageHeader
        eyebrow="Harbour Street kitchen"
        title="Style check"
        description="Every shared piece of the interface, in each of its states. The finishes are the content; the interface stays out of their way."
        actions={
          <>
            <LinkButton href="/style-check" variant="secondary">Back to top</LinkButton>
            <Button>Issue specification</Button>
          </>
        }
      />

      <Section title="Palette" description="Interface colours only. Greys have no tint; spruce is the one accent.">
        <ul className="grid grid-cols-3 gap-3 sm:grid-cols-6">
          {paletteShown.map((n) => (
            <li key={n} className="flex flex-col gap-1 text-sm">
              <span className="h-10 rounded-sm border border-line" style={{ backgroundColor: palette[n] }} />
              <span className="font-medium">{n}</span>
              <span className="figures text-stone-600">{palette[n]}</span>
            </li>
          ))}
        </ul>
      </Section>

      <Section title="Buttons">
        <div className="flex flex-wrap items-center gap-3">
          <Button>Save board</Button>
          <Button variant="secondary">Add finish</Button>
          <Button variant="quiet">Cancel</Button>
          <Button variant="danger">Remove from board</Button>
          <Button pending>Sending</Button>
          <Button variant="secondary" disabled>Not available</Button>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <Button size="lg">Approve this option</Button>
          <Button size="lg" variant="secondary">Ask a question</Button>
          <LinkButton href="/style-check" size="lg" variant="quiet">See all options</LinkButton>
          <Spinner label="Loading finishes" />
        </div>
      </Section>

      <Section title="Swatches" description="Mid-grey surround by default; a pale surround on request. Nothing coloured touches a sample.">
        {(["lg", "md", "sm"] as const).map((size) => (
          <div key={size} className="flex flex-wrap items-start gap-6">
            {finishes.map((f) => (
              <Swatch key={f.name} {...f} size={size} />
            ))}
            {finishes.map((f, i) => (
              <Swatch
                key={`${f.name}-photo`}
                {...f}
                size={size}
                imageUrl={stonePhoto(f.hex, i === 2 ? "#6b6e70" : "#7a6a58")}
                selected={i === 0}
              />
            ))}
          </div>
        ))}
        <div className="flex flex-wrap items-start gap-6">
          <Swatch hex="#f4f1ea" name="Saltbush Limestone" lrv={82} lrvSource="published" surround="light" />
          <Swatch hex="#b89f83" name="Dune Oak" surround="light" selected />
          <Swatch hex="not-a-colour" name="Unmeasured tile" productCode="UT-3" />
          <Swatch hex="#2b2d2f" name="Basalt Night" caption={false} size="sm" selected />
        </div>
      </Section>

      <Section title="Form">
        <Card title="New sample board" level={3} actions={<Button variant="quiet">Clear</Button>}>
          <form className="grid max-w-xl gap-5">
            <Field htmlFor="sc-name" label="Board name" hint={nameHint} error={nameError}>
              <Input {...describeField("sc-name", { hint: nameHint, error: nameError })} name="name" />
            </Field>
            <Field htmlFor="sc-code" label="Product code" error={codeErrors}>
              <Input {...describeField("sc-code", { error: codeErrors })} name="code" defaultValue="sb204" />
            </Field>
            <Field htmlFor="sc-room" label="Room">
              <Select id="sc-room" name="room" defaultValue="kitchen">
                <option value="kitchen">Kitchen</option>
                <option value="ensuite">Ensuite</option>
                <option value="laundry">Laundry</option>
              </Select>
            </Field>
            <Field htmlFor="sc-notes" label="Notes for the client" optional>
              <Textarea id="sc-notes" name="notes" placeholder="What you would like them to look at" />
            </Field>
            <Field htmlFor="sc-locked" label="Studio">
              <Input id="sc-locked" disabled defaultValue="Paperbark Interiors" />
            </Field>
            <div className="flex flex-wrap gap-3">
              <Button type="submit">Save board</Button>
              <Button type="button" variant="secondary">Save as draft</Button>
            </div>
          </form>
        </Card>
      </Section>

      <Section title="Badges and notices">
        <div className="flex flex-wrap gap-2">
          <Badge>Draft</Badge>
          <Badge tone="ok">Approved by client</Badge>
          <Badge tone="caution">Awaiting client</Badge>
          <Badge tone="problem">Discontinued</Badge>
          <Badge tone="info">Issued to supplier</Badge>
        </div>
        <div className="grid max-w-2xl gap-3">
          <Notice title="Colour on a screen is not the finish">
            Screens differ. Judge the physical sample in daylight before you approve it.
          </Notice>
          <Notice tone="caution" title="Engineered stone contains crystalline silica">
            Cutting it makes harmful dust. Fabrication must follow the safe-work rules for silica.
          </Notice>
          <Notice tone="problem" title="This finish is no longer made">
            Choose another before the specification is issued.
          </Notice>
        </div>
      </Section>

      <Section title="Table">
        <Table caption="Benchtop options, Harbour Street kitchen">
          <THead>
            <Tr>
              <Th>Finish</Th>
              <Th numeric>LRV</Th>
              <Th numeric>Difference from splashback</Th>
              <Th numeric>Area</Th>
              <Th numeric>Price</Th>
              <Th numeric>Against option A</Th>
            </Tr>
          </THead>
          <TBody>
            <Tr>
              <Td>Saltbush Limestone <span className="figures text-stone-600">SB-204</span></Td>
              <NumberCell value={82} />
              <NumberCell value={2.31} digits={1} unit="ΔE00" />
              <NumberCell value={4.6} digits={2} unit="m²" />
              <Td numeric><Money cents={123450} /></Td>
              <Td numeric><Money cents={0} signed /></Td>
            </Tr>
            <Tr>
              <Td>Dune Oak, brushed <span className="figures text-stone-600">DO-17</span></Td>
              <NumberCell value={38} />
              <NumberCell value={14.08} digits={1} unit="ΔE00" />
              <NumberCell value={4.6} digits={2} unit="m²" />
              <Td numeric><Money cents={135450} /></Td>
              <Td numeric><Money cents={12000} signed /></Td>
            </Tr>
            <Tr>
              <Td>Basalt Night</Td>
              <NumberCell value={null} />
              <NumberCell value={38.9} digits={1} unit="ΔE00" />
              <NumberCell value={4.6} digits={2} unit="m²" />
              <Td numeric><Money cents={115450} /></Td>
              <Td numeric><Money cents={-8000} signed /></Td>
            </Tr>
          </TBody>
          <TFoot>
            <Tr>
              <Th scope="row" colSpan={4}>Average of options</Th>
              <Td numeric><Money cents={124783} /></Td>
              <Td />
            </Tr>
          </TFoot>
        </Table>
        <p className="text-ink-soft">
          Inline figures: <Figure value={2.31} digits={1} unit="ΔE00" />, <Figure value={62} unit="LRV" unitFirst />,{" "}
          <Figure value={-0.4} digits={1} unit="mm" /> and <Money cents={-8000} signed />.
          <VisuallyHidden> (figures are shown in tabular digits)</VisuallyHidden>
        </p>
      </Section>

      <Section title="Empty state">
        <EmptyState title="No finishes on this board yet" level={3} action={<Button>Add a finish</Button>}>
          Pick finishes from your library to see them side by side on a neutral surround.
        </EmptyState>
      </Section>
    </main>
  );
}
