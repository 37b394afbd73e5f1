import type { Metadata } from "next";
import { getStudioSettings } from "@/db/queries/studio-settings";
import { AccessStandardForm } from "@/components/settings/access-standard-form";
import { StudioSettingsForm } from "@/components/settings/studio-settings-form";
import { Card, Notice, PageHeader } from "@/components/ui";
import { ACCESS_STANDARD_CAUTION, ACCESS_STANDARD_WORDS } from "@/lib/boards/words";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";
import { basisPointsToInput } from "@/lib/pricing/parse-amount";
import { formatBasisPoints } from "@/lib/pricing/option-price";

export const metadata: Metadata = { title: "Studio settings" };

export default async function StudioSettingsPage() {
  const actor = await requireRole("designer");
  const settings = await pageGuard(getStudioSettings(actor));
  return (
    <div className="space-y-8">
      <PageHeader eyebrow={settings.studioName} title="Settings" description="How the studio prices the options it offers clients, and which access standard its colour checks follow." />
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Markup and tax">
          {settings.canChange ? (
            <StudioSettingsForm markup={basisPointsToInput(settings.markupBasisPoints)} tax={basisPointsToInput(settings.taxBasisPoints)} />
          ) : (
            <dl className="space-y-3">
              <div>
                <dt className="text-sm text-ink-soft">Markup on cost</dt>
                <dd className="figures text-lg font-medium">{formatBasisPoints(settings.markupBasisPoints)}</dd>
              </div>
              <div>
                <dt className="text-sm text-ink-soft">Tax on the client&apos;s price</dt>
                <dd className="figures text-lg font-medium">{formatBasisPoints(settings.taxBasisPoints)}</dd>
              </div>
              <p className="text-ink-soft">Only the studio&apos;s owner can change these.</p>
            </dl>
          )}
        </Card>
        <Card title="How an option's price is worked out">
          <div className="space-y-2 text-ink-soft">
            <p>Each finish line costs its library price per unit (cost to the studio, excluding tax) times the quantity, to the cent.</p>
            <p>The option&apos;s price for the client is that cost, plus the markup, plus tax on the lot, rounded to the cent. Clients see only the total, including tax.</p>
            <p>A designer can set an option&apos;s price by hand; it is then marked “Price set by hand” and never worked out again. When these settings change, worked-out prices on decisions the client hasn&apos;t approved follow; approved decisions never change.</p>
          </div>
        </Card>
        <Card title="Access checks for people with low vision">
          {settings.canChange ? (
            <AccessStandardForm current={settings.accessStandard} />
          ) : (
            <dl className="space-y-1">
              <dt className="text-sm text-ink-soft">Access checks follow</dt>
              <dd className="text-lg font-medium">{ACCESS_STANDARD_WORDS[settings.accessStandard].label}</dd>
              <dd className="text-ink">{ACCESS_STANDARD_WORDS[settings.accessStandard].rule}</dd>
              <dd className="text-ink-soft">Only the studio&apos;s owner can change this.</dd>
            </dl>
          )}
        </Card>
        <Card title="How to choose">
          <div className="space-y-3 text-ink-soft">
            <p>
              Pairs marked as mattering for access (a door against its wall, a step edge, a benchtop edge against the floor) are checked by the one standard chosen here, and every
              verdict names it: “Passes AS 1428.1: 42 % luminance contrast, 30 % needed”.
            </p>
            <p>
              AS 1428.1 is the Australian measure; BS 8300-2 is the UK one. They can disagree: a dark pair can pass AS 1428.1&apos;s luminance contrast while being fewer than 30 LRV points
              apart. Choose the standard your projects are built to; choose both only where either could be asked for.
            </p>
            <Notice tone="caution" title="Guidance, not approval">
              {ACCESS_STANDARD_CAUTION}
            </Notice>
          </div>
        </Card>
      </div>
    </div>
  );
}
