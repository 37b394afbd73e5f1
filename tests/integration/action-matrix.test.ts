import path from "node:path";
import { describe, expect, it, vi } from "vitest";
import { idle, type ActionResult } from "@/lib/actions/result";
import { discoverActions } from "@/tests/support/app-routes";
import { actAs, type Persona } from "@/tests/support/session";

/**
 * The server-action half of the permission matrix: every exported action of every "use server"
 * file, found from the tree, called as every person with an empty form. A person refused answers
 * 401/403/404 before anything else; "through" means the gate let them pass (the empty form then
 * fails validation, or the action does its harmless work in this test's own database).
 */
// The sign-in actions import Auth.js's error class; the real package needs Next's bundler to load.
vi.mock("next-auth", () => ({ AuthError: class AuthError extends Error {} }));

type Outcome = 401 | 403 | 404 | "through";
const PEOPLE: Persona[] = ["owner", "designer", "other", "client", "otherclient", "stone", "joinery", "anonymous"];
const project = "demo-project-marrow";

const anyone: Record<Persona, Outcome> = Object.fromEntries(PEOPLE.map((p) => [p, "through"])) as Record<Persona, Outcome>;
const studioStaff: Record<Persona, Outcome> = { ...anyone, client: 403, client2: 403, otherclient: 403, stone: 403, joinery: 403, anonymous: 401 };
const projectStaff: Record<Persona, Outcome> = { ...studioStaff, other: 404 };
const ownersOnly: Record<Persona, Outcome> = { ...studioStaff, designer: 403 };

const EXPECTED: Record<string, { args: unknown[]; form?: Record<string, string>; expect: Record<Persona, Outcome> }> = {
  "app/(public)/sign-in/actions.ts#requestSignInLink": { args: [], expect: anyone },
  "app/(public)/sign-in/actions.ts#signInWithPassword": { args: [], expect: anyone },
  "app/(public)/sign-up/actions.ts#signUp": { args: [], expect: anyone },
  "lib/actions/sign-out.ts#signOutAction": { args: [], expect: anyone },
  "app/studio/projects/new/actions.ts#createProjectAction": { args: [], expect: studioStaff },
  "app/studio/team/actions.ts#inviteDesignerAction": { args: [], expect: ownersOnly },
  "app/studio/settings/actions.ts#saveStudioSettingsAction": { args: [], expect: ownersOnly },
  "app/studio/projects/[projectId]/actions.ts#inviteToProjectAction": { args: [], form: { projectId: project }, expect: projectStaff },
  // Anyone signed in may answer an invitation; an empty form (no invitation) fails validation.
  "app/welcome/actions.ts#answerInvitationAction": { args: [], expect: { ...anyone, anonymous: 401 } },
  "app/welcome/actions.ts#answerStudioInvitationAction": { args: [], expect: { ...anyone, anonymous: 401 } },
  // A joined designer's id: the owner gets past the gate (409, "remove them instead"); another studio's owner finds no such entry.
  "app/studio/team/actions.ts#withdrawTeamInvitationAction": { args: [], form: { entryId: "demo-user-designer" }, expect: { ...ownersOnly, other: 404 } },
  // These forms post their ids in hidden inputs (see lib/actions/form-ids.ts), so the ids go in the form.
  "app/studio/projects/[projectId]/boards/actions.ts#createBoardAction": { args: [], form: { projectId: project }, expect: projectStaff },
  "app/studio/projects/[projectId]/specification/actions.ts#saveFixedItemAction": { args: [], form: { projectId: project }, expect: projectStaff },
  // The owner goes first and really removes the item, so the designer then finds it gone.
  "app/studio/projects/[projectId]/specification/actions.ts#removeFixedItemAction": {
    args: [],
    form: { projectId: project, fixedItemId: "demo-fixed-oven" },
    expect: { ...projectStaff, designer: 404 },
  },
  "app/studio/projects/[projectId]/specification/actions.ts#issueRevisionAction": { args: [], form: { projectId: project }, expect: projectStaff },
  // The owner goes first and really confirms the laundry benchtop's line (a variation overtook it); the designer then finds it confirmed.
  "app/studio/projects/[projectId]/specification/revisions/[revisionId]/actions.ts#confirmLineAction": {
    args: [],
    form: { revisionId: "demo-revision-a", lineId: "demo-spec-line-a-6" },
    expect: projectStaff,
  },
  // The supplier directory: an empty form fails validation; a supplier id is checked as this studio's first.
  "app/studio/suppliers/actions.ts#saveSupplierAction": { args: [], expect: studioStaff },
  "app/studio/suppliers/actions.ts#archiveSupplierAction": { args: [], form: { supplierId: "demo-supplier-stone", archived: "0" }, expect: projectStaff },
  "app/studio/suppliers/actions.ts#deleteSupplierAction": { args: [], form: { supplierId: "demo-supplier-stone" }, expect: projectStaff },
  // Corrections: an empty form fails validation; removals use ids whose removal is refused (409),
  // except removing a member, which the owner really does, so the designer then finds them gone.
  "app/studio/projects/[projectId]/actions.ts#editProjectAction": { args: [], form: { projectId: project }, expect: projectStaff },
  "app/studio/projects/[projectId]/room-actions.ts#addRoomAction": { args: [], form: { projectId: project }, expect: projectStaff },
  "app/studio/projects/[projectId]/room-actions.ts#roomAction": { args: [], form: { projectId: project, roomId: "demo-room-kitchen", intent: "remove" }, expect: projectStaff },
  "app/studio/projects/[projectId]/member-actions.ts#changeMemberRoleAction": { args: [], form: { projectId: project, userId: "demo-user-client2" }, expect: projectStaff },
  "app/studio/projects/[projectId]/member-actions.ts#removeMemberAction": {
    args: [],
    form: { projectId: project, userId: "demo-user-joinery" },
    expect: { ...projectStaff, designer: 404 },
  },
  "app/studio/projects/[projectId]/member-actions.ts#withdrawInvitationAction": { args: [], form: { projectId: project, entryId: "demo-member-client" }, expect: projectStaff },
  "app/studio/team/staff-actions.ts#changeStaffRoleAction": { args: [], form: { userId: "demo-user-designer" }, expect: { ...ownersOnly, other: 404 } },
  "app/studio/team/staff-actions.ts#removeStaffAction": { args: [], form: { userId: "demo-user-owner" }, expect: { ...ownersOnly, other: 404 } },
  "app/account/actions.ts#saveProfileAction": { args: [], expect: { ...anyone, anonymous: 401 } },
  "app/account/actions.ts#setPasswordAction": { args: [], expect: { ...anyone, anonymous: 401 } },
};

type Action = (...args: unknown[]) => Promise<ActionResult<unknown> | undefined>;

function formOf(fields: Record<string, string> = {}): FormData {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) form.set(key, value);
  return form;
}

async function outcomeOf(action: Action, args: unknown[], fields?: Record<string, string>): Promise<Outcome> {
  try {
    const result = await action(...args, idle, formOf(fields));
    if (result && !result.ok && (result.status === 401 || result.status === 403 || result.status === 404)) return result.status;
    return "through";
  } catch {
    return "through"; // a redirect or a request-only API after the gate: it got past the gate
  }
}

describe("permission matrix: every server action, as every person", () => {
  const actions = discoverActions();

  it("has an expectation for every server action", () => {
    const missing = actions.map((a) => `${a.file}#${a.name}`).filter((key) => !EXPECTED[key]);
    expect(missing).toEqual([]);
  });

  it("lets through exactly the people it should", { timeout: 120_000 }, async () => {
    const failures: string[] = [];
    const table: string[] = [["action", ...PEOPLE].join(" | ")];
    for (const { file, name } of actions) {
      const key = `${file}#${name}`;
      const expectation = EXPECTED[key];
      if (!expectation) continue;
      const mod = (await import(path.resolve(file))) as Record<string, Action>;
      const action = mod[name];
      if (!action) throw new Error(`${key} is not exported`);
      const cells: string[] = [];
      for (const person of PEOPLE) {
        actAs(person);
        const got = await outcomeOf(action, expectation.args, expectation.form);
        const want = expectation.expect[person];
        cells.push(got === want ? String(got) : `${got}≠${want}`);
        if (got !== want) failures.push(`${key} as ${person}: got ${got}, expected ${want}`);
      }
      table.push([key, ...cells].join(" | "));
    }
    console.log(`\nServer actions (${actions.length} × ${PEOPLE.length} people)\n${table.join("\n")}\n`);
    expect(failures).toEqual([]);
  });
});
