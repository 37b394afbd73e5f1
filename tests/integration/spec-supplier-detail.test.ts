import { parse } from "csv-parse/sync";
import { beforeAll, describe, expect, it } from "vitest";
import { POST as issue } from "@/app/api/projects/[projectId]/revisions/route";
import { GET as getRevision } from "@/app/api/revisions/[revisionId]/route";
import { GET as exportCsv } from "@/app/api/revisions/[revisionId]/export.csv/route";
import { GET as getPhoto } from "@/app/api/uploads/[imageId]/[variant]/route";
import { POST as upload } from "@/app/api/uploads/route";
import { readCaughtMail } from "@/lib/mail/caught";
import { call as libraryCall, fileForm, makeFlatImage, runSql } from "@/tests/support/library";
import { actAsAny, call, project, revisionA, stone, type SpecPersona } from "./spec-helpers";

// What a supplier needs to act on their lines without phoning the studio (the brief for this
// screen): site address and install date, each finish's surface, format, code and photo, where it
// goes, and whom to ask. Never a price, an allowance or another supplier's line (PRODUCT.md).
type Line = { item: string; supplierId: string; finishName: string; surface: string | null; format: string | null; photo: { thumbUrl: string; url: string } | null };

const saltbush = "demo-finish-saltbush";
const cooktop = "demo-finish-app-induction-900";
let saltbushPhoto = "";
let cooktopPhoto = "";

async function uploadPhoto(hex: string): Promise<string> {
  const res = await libraryCall("designer", upload, "/api/uploads", { method: "POST", form: fileForm(await makeFlatImage("png", hex), "sample.png", "image/png") });
  expect(res.status).toBe(201);
  return String(res.body.id);
}

const as = async <T>(persona: SpecPersona, work: () => Promise<T>) => {
  actAsAny(persona);
  return work();
};
const photo = (persona: SpecPersona, imageId: string) => as(persona, () => call(getPhoto, { imageId, variant: "400" }));
// Words only staff may see: other suppliers of revision A, and anything about money.
const secrets = ["Hearthline", "Lanternfield", "Groundswell", "demo-supplier-appliances", "price", "Cents", "allowance", "680.00", "68000"];

beforeAll(async () => {
  saltbushPhoto = await uploadPhoto("#d9d2c3");
  cooktopPhoto = await uploadPhoto("#333333");
  await runSql(`update "finish" set "image_id" = ? where "id" = ?`, [saltbushPhoto, saltbush]);
  await runSql(`update "finish" set "image_id" = ? where "id" = ?`, [cooktopPhoto, cooktop]);
  await runSql(`update "user" set "phone" = ? where "id" = ?`, ["0400 123 456", "demo-user-designer"]);
});

describe("a supplier's revision page data", () => {
  it("carries the site, install date, studio contact and each finish's surface, format and photo", async () => {
    const res = await as("stone", () => call(getRevision, { revisionId: revisionA }));
    expect(res.status).toBe(200);
    expect(res.body.project).toMatchObject({ siteAddress: "14 Marrow Street, Eastbrook", installDate: "2027-04-12" });
    // Revision A was issued by the designer, who is still on the team: they are the contact.
    expect(res.body.contact).toEqual({ name: "Rafe Lindqvist", email: "designer@demo.example", phone: "0400 123 456", studioName: expect.any(String) as string });
    const lines = res.body.lines as Line[];
    const benchtop = lines.find((l) => l.item === "Benchtop");
    expect(benchtop).toMatchObject({ surface: "honed", format: "20 mm slab, 3200 × 1600", photo: { thumbUrl: `/api/uploads/${saltbushPhoto}/400`, url: `/api/uploads/${saltbushPhoto}/1600` } });
    expect(lines.find((l) => l.item === "Laundry benchtop")).toMatchObject({ surface: "matt", format: "12 mm slab, 3200 × 1600", photo: null });
    for (const word of [...secrets, cooktopPhoto]) expect(res.text).not.toContain(word);
  });

  it("still verifies revision A: the new fields are read at view time, not frozen into its hash", async () => {
    const res = await as("designer", () => call(getRevision, { revisionId: revisionA }));
    expect(res.body.verified).toBe(true);
    expect(res.body.content).not.toContain("surface");
  });
});

describe("a supplier's CSV", () => {
  it("has the surface, format, photo link, site, install date and contact on their rows only (RFC 4180 read back)", async () => {
    const res = await as("stone", () => call(exportCsv, { revisionId: revisionA }, { path: `/api/revisions/${revisionA}/export.csv` }));
    expect(res.status).toBe(200);
    const rows = parse(res.text, { bom: true, columns: true }) as Record<string, string>[];
    expect(rows.map((r) => r["Item"]).sort()).toEqual(["Benchtop", "Laundry benchtop"]);
    const benchtop = rows.find((r) => r["Item"] === "Benchtop");
    expect(benchtop).toMatchObject({
      Surface: "honed",
      Format: "20 mm slab, 3200 × 1600",
      Photo: `http://mottle.test/api/uploads/${saltbushPhoto}/1600`,
      "Site address": "14 Marrow Street, Eastbrook",
      "Install date": "2027-04-12",
      "Contact e-mail": "designer@demo.example",
      "Contact phone": "0400 123 456",
    });
    expect(rows.every((r) => r["Supplier"] === "Ridgeline Stoneworks")).toBe(true);
    for (const word of [...secrets, cooktopPhoto]) expect(res.text).not.toContain(word);
  });
});

describe("the finish photo on a supplier's line", () => {
  it.each<[SpecPersona, "saltbush" | "cooktop", number]>([
    ["stone", "saltbush", 200], // the project's stone contact: the benchtop line is theirs
    ["stone", "cooktop", 404], // another supplier's line on the same revision
    ["appliances", "cooktop", 200],
    ["appliances", "saltbush", 404],
    ["joinery", "saltbush", 404], // a supplier of the project with nothing in revision A
    ["client", "saltbush", 200], // the project uses the finish (README, uploads)
    ["otherclient", "saltbush", 404],
    ["other", "saltbush", 404],
    ["anonymous", "saltbush", 401],
  ])("GET the photo as %s for the %s finish → %i", async (persona, which, status) => {
    const res = await photo(persona, which === "saltbush" ? saltbushPhoto : cooktopPhoto);
    expect(res.status).toBe(status);
    if (status === 200) expect(res.headers.get("content-type")).toMatch(/^image\//);
  });
});

async function mailTo(address: string, subject: string) {
  for (let i = 0; i < 50; i++) {
    const found = (await readCaughtMail(process.env.MAIL_CATCHER_DIR ?? "", { to: address })).filter((m) => m.subject.includes(subject));
    if (found.length) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  return [];
}

describe("the revision issued e-mail and the contact rule", () => {
  it("tells each supplier the site, install date, their lines with surface and format, and whom to ask", async () => {
    const issued = await as("designer", () => call(issue, { projectId: project }, { method: "POST" }));
    expect(issued.status).toBe(201);
    const [mail] = await mailTo("stone@demo.example", "Revision B issued");
    const text = mail?.text ?? "";
    expect(text).toContain("Site: 14 Marrow Street, Eastbrook.");
    expect(text).toContain("Install date: Mon 12 Apr 2027.");
    expect(text).toContain("Kitchen · Perimeter and island: Benchtop. Saltbush Limestone, Honed, 20 mm slab, 3200 × 1600, code RS-LM-204. 6.5 m²; order by Mon 22 Mar 2027.");
    expect(text).toContain("Laundry: Laundry benchtop. Chalk Porcelain Slab, Matt, 12 mm slab, 3200 × 1600, code RS-PS-402.");
    expect(text).toContain("Questions: Rafe Lindqvist at");
    expect(text).toContain("designer@demo.example, 0400 123 456.");
    for (const word of [...secrets, "Cooktop", "Downlights"]) expect(text).not.toContain(word);
  });

  it("names the studio's owner when whoever issued the revision has left the team", async () => {
    await runSql(`delete from "studio_member" where "user_id" = ?`, ["demo-user-designer"]);
    const res = await as("stone", () => call(getRevision, { revisionId: revisionA }));
    expect((res.body.contact as { email: string }).email).toBe("owner@demo.example");
    // Still never another supplier's line or a price, whoever the contact is.
    expect((res.body.lines as Line[]).every((l) => l.supplierId === stone)).toBe(true);
  });
});
