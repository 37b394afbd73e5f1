import { describe, expect, it } from "vitest";
import { compareToAllowance, summariseBudget } from "@/lib/decisions/budget";

// Prime-cost allowances: over the allowance the owner pays the difference, under it they are
// credited. [published: builders' association guidance, as summarised in DOMAIN.md]
describe("compareToAllowance", () => {
  it("says over, under or on, in whole cents", () => {
    expect(compareToAllowance(884000, 900000)).toEqual({ differenceCents: -16000, direction: "under" });
    expect(compareToAllowance(1215000, 900000)).toEqual({ differenceCents: 315000, direction: "over" });
    expect(compareToAllowance(150000, 150000)).toEqual({ differenceCents: 0, direction: "on" });
  });
});

describe("summariseBudget", () => {
  it("adds the demo project by hand: approved, picked, and still open at their allowance", () => {
    // The demo's six decisions (db/seed/demo-decisions.ts), worked by hand:
    //   allowances 9,000 + 18,000 + 1,500 + 3,200 + 1,800 + 2,500 = $36,000.00
    //   approved   benchtop 8,840 + laundry 2,160 + its variation 0 = $11,000.00
    //   picked     cabinets 17,600                                   = $17,600.00
    //   open       pendant 1,500 + splashback 3,200 + floor 1,800    =  $6,500.00
    //   running    11,000 + 17,600 + 6,500 = $35,100.00, i.e. $900.00 under.
    const summary = summariseBudget([
      { allowanceCents: 900000, status: "locked", priceCents: 884000, variationCents: 0 },
      { allowanceCents: 1800000, status: "chosen", priceCents: 1760000 },
      { allowanceCents: 150000, status: "open", priceCents: null },
      { allowanceCents: 320000, status: "open", priceCents: null },
      { allowanceCents: 180000, status: "open", priceCents: null },
      { allowanceCents: 250000, status: "locked", priceCents: 216000, variationCents: 0 },
    ]);
    expect(summary).toEqual({
      allowanceCents: 3600000,
      approvedCents: 1100000,
      pickedCents: 1760000,
      openAllowanceCents: 650000,
      runningCents: 3510000,
      differenceCents: -90000,
      counts: { approved: 2, picked: 1, open: 3 },
    });
  });

  it("adds approved variations (including GST) to what was first approved", () => {
    const summary = summariseBudget([{ allowanceCents: 100000, status: "locked", priceCents: 98000, variationCents: 38500 }]);
    expect(summary.approvedCents).toBe(136500);
    expect(summary.differenceCents).toBe(36500);
  });

  it("is all zeros for a project with no decisions", () => {
    expect(summariseBudget([]).runningCents).toBe(0);
  });
});
