import { describe, expect, it, vi } from "vitest";
import * as roomsRoute from "@/app/api/projects/[projectId]/rooms/route";
import * as roomRoute from "@/app/api/projects/[projectId]/rooms/[roomId]/route";
import { roomAction } from "@/app/studio/projects/[projectId]/room-actions";
import { idle } from "@/lib/actions/result";
import { auditActions, queryRows } from "@/tests/support/db-read";
import { call, demo } from "@/tests/support/decision-calls";
import { actAs, type Persona } from "@/tests/support/session";

vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const add = (body: unknown) => call(roomsRoute.POST, { projectId: demo.project }, { method: "POST", body });
const edit = (roomId: string, body: unknown) => call(roomRoute.PATCH, { projectId: demo.project, roomId }, { method: "PATCH", body });
const remove = (roomId: string) => call(roomRoute.DELETE, { projectId: demo.project, roomId }, { method: "DELETE" });
const roomNames = async () => (await queryRows(`select name from room where project_id = ? order by sort_order, name`, [demo.project])).map((r) => String(r.name));

// Status codes per RFC 9110 §15: 400, 401, 403, 404, 409 (Conflict: the room still holds work).
describe("rooms of a project", () => {
  it.each<[Persona, number]>([["anonymous", 401], ["client", 403], ["joinery", 403], ["other", 404]])("refuses %s with %i on every room route, changing nothing", async (persona, status) => {
    const before = await roomNames();
    actAs(persona);
    expect((await add({ name: "Cellar" })).status).toBe(status);
    expect((await edit(demo.room("laundry"), { name: "Cellar" })).status).toBe(status);
    expect((await remove(demo.room("laundry"))).status).toBe(status);
    expect(await roomNames()).toEqual(before);
  });

  it("refuses bad bodies with field errors, writing nothing", async () => {
    actAs("designer");
    const before = await roomNames();
    expect((await add({ name: "" })).body.fieldErrors).toHaveProperty("name");
    expect((await add({ name: "x".repeat(61) })).status).toBe(400);
    expect((await add({ name: "kitchen" })).body.fieldErrors).toHaveProperty("name"); // already a Kitchen
    expect((await edit(demo.room("laundry"), {})).status).toBe(400);
    expect((await edit(demo.room("laundry"), { position: 1.5 })).body.fieldErrors).toHaveProperty("position");
    expect((await edit(demo.room("laundry"), { position: 3 })).body.fieldErrors).toHaveProperty("position"); // three rooms: 0…2
    expect((await edit(demo.room("laundry"), { name: "Ensuite" })).status).toBe(400);
    expect((await edit("no-such-room", { name: "Cellar" })).status).toBe(404);
    expect((await edit(demo.room("kitchen"), { name: "Cellar", sortOrder: 2 })).status).toBe(400);
    expect(await roomNames()).toEqual(before);
  });

  it("adds at the end, renames, moves and numbers the list 0…n−1 again, auditing each", async () => {
    actAs("designer");
    const added = await add({ name: "Powder room" });
    expect(added.status).toBe(201);
    const id = String(added.body.id);
    expect(await roomNames()).toEqual(["Kitchen", "Laundry", "Ensuite", "Powder room"]);
    const moved = await edit(id, { name: "Powder", position: 0 });
    expect(moved.status).toBe(200);
    expect((moved.body.rooms as { name: string; sortOrder: number }[]).map((r) => [r.name, r.sortOrder])).toEqual([["Powder", 0], ["Kitchen", 1], ["Laundry", 2], ["Ensuite", 3]]);
    expect(await auditActions(id)).toEqual(["room.added", "room.renamed", "room.moved"]);
    expect((await remove(id)).status).toBe(204);
    expect(await roomNames()).toEqual(["Kitchen", "Laundry", "Ensuite"]);
    expect((await queryRows(`select sort_order from room where project_id = ? order by sort_order`, [demo.project])).map((r) => Number(r.sort_order))).toEqual([0, 1, 2]);
    expect(await auditActions(id)).toContain("room.removed");
    expect((await remove(id)).status).toBe(404);
  });

  it("refuses to remove a room that holds boards, decisions or fixed items (409), saying what is in it", async () => {
    actAs("owner");
    const [counts] = await queryRows(
      `select (select count(*) from board where room_id = ?1) as boards, (select count(*) from decision where room_id = ?1) as decisions`,
      [demo.room("kitchen")],
    );
    const res = await remove(demo.room("kitchen"));
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(new RegExp(`^Kitchen has ${String(counts?.boards)} boards?, ${String(counts?.decisions)} decisions?( and \\d+ fixed items?)?; move or remove them first\\.$|^Kitchen has ${String(counts?.boards)} boards? and ${String(counts?.decisions)} decisions?; move or remove them first\\.$`));
    expect(await roomNames()).toContain("Kitchen");
  });

  it("works as a form without JavaScript: Move down, then a refused Remove keeps the room", async () => {
    actAs("designer");
    const form = (fields: Record<string, string>) => {
      const f = new FormData();
      for (const [k, v] of Object.entries({ projectId: demo.project, ...fields })) f.set(k, v);
      return f;
    };
    expect(await roomAction(idle, form({ roomId: demo.room("kitchen"), index: "0", intent: "down" }))).toEqual({ ok: true, data: undefined });
    expect(await roomNames()).toEqual(["Laundry", "Kitchen", "Ensuite"]);
    const refused = await roomAction(idle, form({ roomId: demo.room("kitchen"), index: "1", intent: "remove" }));
    expect(refused).toMatchObject({ ok: false, status: 409 });
    const renamed = await roomAction(idle, form({ roomId: demo.room("kitchen"), index: "1", intent: "rename", name: "" }));
    expect(renamed).toMatchObject({ ok: false, status: 400, values: { name: "" } });
    expect(renamed.ok ? null : renamed.fieldErrors).toHaveProperty("name");
  });
});
