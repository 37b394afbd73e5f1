import { describe, expect, it } from "vitest";
import { GET as getMe } from "@/app/api/me/route";
import { GET as getProjects } from "@/app/api/projects/route";
import { actAs, type Persona } from "@/tests/support/session";

const call = async (handler: (r: Request, c: unknown) => Promise<Response>, path: string) => {
  const res = await handler(new Request(`http://test${path}`), {});
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
};

describe("GET /api/me", () => {
  it("answers 401 with a JSON error when signed out", async () => {
    actAs("anonymous");
    const { status, body } = await call(getMe, "/api/me");
    expect(status).toBe(401);
    expect(body.error).toMatch(/sign in/i);
  });

  it.each<[Persona, string[], string]>([
    ["owner", ["owner"], "/studio"],
    ["designer", ["designer"], "/studio"],
    ["client", ["client"], "/client"],
    ["stone", ["supplier"], "/supplier"],
  ])("tells %s their roles and home", async (persona, roles, home) => {
    actAs(persona);
    const { status, body } = await call(getMe, "/api/me");
    expect(status).toBe(200);
    expect(body.roles).toEqual(roles);
    expect(body.home).toBe(home);
  });
});

describe("GET /api/projects", () => {
  const names = async (persona: Persona) => {
    actAs(persona);
    const { status, body } = await call(getProjects, "/api/projects");
    expect(status).toBe(200);
    return (body.items as { name: string; role: string }[]).map((p) => `${p.name}:${p.role}`);
  };

  it("shows studio staff their own studio's projects only", async () => {
    expect(await names("designer")).toEqual(["Marrow Street terrace:staff"]);
    expect(await names("other")).toEqual(["Quarry Lane cottage:staff"]);
  });

  it("shows clients and suppliers only the projects they belong to", async () => {
    expect(await names("client")).toEqual(["Marrow Street terrace:client"]);
    expect(await names("stone")).toEqual(["Marrow Street terrace:supplier"]);
  });

  it("counts the open decisions of each project", async () => {
    actAs("designer");
    const { body } = await call(getProjects, "/api/projects");
    const [project] = body.items as { openDecisions: number }[];
    expect(project?.openDecisions).toBe(4);
  });

  it("answers 401 when signed out", async () => {
    actAs("anonymous");
    expect((await call(getProjects, "/api/projects")).status).toBe(401);
  });
});
