import type { DecisionStatus, VariationStatus } from "@/db/schema";
import type { PriceBuild, StudioRates } from "@/lib/pricing/option-price";
import type { AllowanceComparison, BudgetSummary } from "./budget";
import type { OptionChecks } from "./option-checks";
import type { OrderBySuggestion } from "./order-by";

/** What screens and the JSON API show of a decision. Times are ISO strings so both read the same. */

export type PersonRef = { id: string; name: string };

export type LineView = {
  id: string;
  finishId: string;
  finishName: string;
  productCode: string | null;
  category: string;
  surface: string | null;
  hex: string;
  lrv: number;
  lrvSource: "published" | "photo" | "computed";
  quantity: number;
  unit: string;
  /** What the line is, when the designer named it; the decision's title stands in otherwise. */
  item: string | null;
  location: string | null;
  leadTimeDays: number;
  supplierName: string | null;
  cautions: string[];
};

/**
 * Staff only: how the option's price is built from its lines today (cost excludes tax, the total
 * includes it), and whether the stored price was set by hand instead.
 */
export type OptionPriceDetail = { overridden: boolean; build: PriceBuild; rates: StudioRates };

export type OptionView = {
  id: string;
  label: string;
  /** The client's price, including tax. */
  priceCents: number;
  /** null for clients: they see only the price including tax. */
  priceDetail: OptionPriceDetail | null;
  notes: string | null;
  boardId: string | null;
  boardName: string | null;
  sortOrder: number;
  addedByVariation: boolean;
  comparison: AllowanceComparison;
  lines: LineView[];
  checks: OptionChecks;
  /** Keys into lib/cautions.ts from every finish on the option, once each. */
  cautionKeys: string[];
};

export type ChoiceView = { id: string; optionId: string; optionLabel: string; by: PersonRef; comment: string | null; at: string };

export type ApprovalView = {
  id: string;
  optionId: string;
  optionLabel: string;
  by: PersonRef;
  at: string;
  variationId: string | null;
  snapshot: Record<string, unknown>;
};

export type VariationView = {
  id: string;
  status: VariationStatus;
  reason: string;
  requestedBy: PersonRef;
  requestedAt: string;
  optionId: string | null;
  optionLabel: string | null;
  priceDeltaCents: number | null;
  timeImpactDays: number | null;
  pricedBy: PersonRef | null;
  /** Milliseconds: the client sends it back on approval so a re-priced variation is looked at again. */
  pricedAt: number | null;
  decidedBy: PersonRef | null;
  decidedAt: string | null;
};

export type DecisionView = {
  id: string;
  projectId: string;
  projectName: string;
  installDate: string | null;
  roomId: string;
  roomName: string;
  title: string;
  allowanceCents: number;
  dueDate: string;
  status: DecisionStatus;
  version: number;
  lockedOptionId: string | null;
  lockedAt: string | null;
  orderBy: OrderBySuggestion | null;
  viewer: { id: string; role: "staff" | "client" };
  options: OptionView[];
  /** The studio's tax on every price shown (1000 = GST 10 %), for the words beside a price. */
  taxBasisPoints: number;
  /** Staff only: the studio's markup and tax, for working out prices in the forms. */
  rates: StudioRates | null;
  currentChoice: ChoiceView | null;
  /** The newest picks first, at most a screenful; `earlierChoiceCount` more are not listed. */
  choices: ChoiceView[];
  earlierChoiceCount: number;
  approvals: ApprovalView[];
  variations: VariationView[];
  budget: BudgetSummary;
  /** Staff only: an approved variation is newer than the last issued specification revision. */
  specNeedsRevision: boolean;
};

export type DecisionListItem = {
  id: string;
  title: string;
  roomId: string;
  roomName: string;
  dueDate: string;
  status: DecisionStatus;
  allowanceCents: number;
  optionCount: number;
  /** The option the decision carries (locked) or the client's current pick (chosen). */
  currentOption: { id: string; label: string; priceCents: number } | null;
  approvedBy: string | null;
  openVariation: VariationStatus | null;
  orderBy: OrderBySuggestion | null;
};

/** A finish as the option editor offers it. */
export type PickerFinish = {
  id: string;
  name: string;
  category: string;
  productCode: string | null;
  surface: string | null;
  supplierName: string | null;
  unit: string;
  /** Cost to the studio per unit, excluding tax. */
  unitPriceCents: number;
  leadTimeDays: number;
  hex: string;
};
