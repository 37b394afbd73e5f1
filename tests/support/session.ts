/**
 * The session the mocked Auth.js returns (tests/integration/setup.ts); set it with `actAs`.
 * Like a real cookie it is sealed with the person's session version, at the first request after
 * it is set (as if they signed in then), so `endSessions` ends it: act, make a request, end the
 * sessions, and the next request is signed out until you act again.
 */
export type StubSession = { user: { id: string }; expires: string; sessionVersion?: number };
export const sessionStub: { current: StubSession | null } = { current: null };

export const demoUserId = (key: string) => `demo-user-${key}`;

export type Persona = "owner" | "designer" | "other" | "client" | "client2" | "otherclient" | "stone" | "joinery" | "anonymous";

export function actAs(persona: Persona) {
  sessionStub.current =
    persona === "anonymous" ? null : { user: { id: demoUserId(persona) }, expires: new Date(Date.now() + 3_600_000).toISOString() };
}

async function stubClaims() {
  const session = sessionStub.current;
  if (!session) return null;
  if (session.sessionVersion === undefined) {
    const { currentSessionVersion } = await import("@/db/queries/sessions");
    session.sessionVersion = (await currentSessionVersion(session.user.id)) ?? 0;
  }
  return { userId: session.user.id, sessionVersion: session.sessionVersion };
}

/** What tests/integration/setup.ts puts in place of lib/auth/index.ts. */
export const authModuleStub = {
  auth: async () => sessionStub.current,
  sessionClaims: stubClaims,
  signIn: async () => undefined,
  signOut: async () => undefined,
  // Auth.js's own endpoints: a link request that got past our limits ends at the check-e-mail page.
  handlers: {
    GET: async () => Response.json({}),
    POST: async () => new Response(null, { status: 302, headers: { location: "/sign-in/check-email" } }),
  },
};
