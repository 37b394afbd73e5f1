import { describe, expect, it } from "vitest";
import { inviteToProject } from "@/db/queries/project-invite";
import { getProjectForActor, getProjectForStaff } from "@/db/queries/projects";
import { addDesigner, createStudioWithOwner } from "@/db/queries/studios";
import { getActor } from "@/db/queries/users";
import { HttpError } from "@/lib/http";
import { signUpSchema } from "@/lib/validation/auth";
import { projectInviteeSchema } from "@/lib/validation/project-invite";
import { demoUserId } from "@/tests/support/session";

const actor = async (key: string) => {
  const a = await getActor(demoUserId(key));
  if (!a) throw new Error(`no demo user ${key}`);
  return a;
};
const status = (p: Promise<unknown>) => p.then(() => 200, (e: unknown) => (e instanceof HttpError ? e.status : 500));
const project = "demo-project-marrow";

describe("studios and project members", () => {
  it("creates a studio with its owner, and leaves an address that already has an account as it was", async () => {
    const input = signUpSchema.parse({ studioName: "Test Studio", name: "Ada Test", email: "Ada@Example.com", password: "long-enough-pass" });
    const outcome = await createStudioWithOwner(input);
    if (!outcome.created) throw new Error("expected a new studio");
    expect((await getActor(outcome.userId))?.email).toBe("ada@example.com");
    expect((await getActor(outcome.userId))?.studio?.role).toBe("owner");
    // Sign-up answers both alike (app/(public)/sign-up/actions.ts); only the caller learns which.
    expect(await createStudioWithOwner(input)).toEqual({ created: false });
  });

  it("refuses to add a designer already on this studio's staff; another studio's is only invited", async () => {
    const owner = await actor("owner");
    expect(await status(addDesigner(owner.studio?.id ?? "", owner.userId, { email: "designer@demo.example", name: "x" }))).toBe(409);
    // The owner is told "Invitation sent" either way (app/studio/team/actions.ts); only the caller learns which.
    expect(await addDesigner(owner.studio?.id ?? "", owner.userId, { email: "other@demo.example", name: "x" })).toEqual({ kind: "invited", email: "other@demo.example" });
    expect((await actor("other")).studio?.name).toBe("Northwall Design Co.");
  });

  it("invites a new client once; inviting again before they sign in only sends the e-mail again", async () => {
    const designer = await actor("designer");
    const input = projectInviteeSchema.parse({ email: "new.client@example.com", name: "New Client", role: "client" });
    expect((await inviteToProject(designer, project, input)).kind).toBe("added");
    expect((await inviteToProject(designer, project, input)).kind).toBe("added");
    // A member who has signed in (the seeded client) is already on it: 409.
    expect(await status(inviteToProject(designer, project, { ...input, email: "client@demo.example" }))).toBe(409);
  });

  it("refuses a supplier contact for another studio's supplier", async () => {
    const designer = await actor("designer");
    const input = projectInviteeSchema.parse({ email: "x@example.com", name: "X", role: "supplier", supplierId: "demo-supplier-northwall-stone" });
    expect(await status(inviteToProject(designer, project, input))).toBe(400);
  });

  it("hides a project from another studio (404) and keeps clients out of staff work (403)", async () => {
    expect(await status(getProjectForActor(await actor("other"), project))).toBe(404);
    expect(await status(inviteToProject(await actor("other"), project, projectInviteeSchema.parse({ email: "y@example.com", name: "Y", role: "client" })))).toBe(404);
    expect(await status(getProjectForStaff(await actor("client"), project))).toBe(403);
    expect(await status(getProjectForActor(await actor("client"), "demo-project-quarry"))).toBe(404);
  });

  it("validates invitations with field errors", () => {
    const result = projectInviteeSchema.safeParse({ email: "not-an-email", name: "", role: "supplier" });
    expect(result.success).toBe(false);
    const fields = result.success ? [] : result.error.issues.map((i) => i.path.join("."));
    expect(fields).toEqual(expect.arrayContaining(["email", "name", "supplierId"]));
  });
});
