/** The session the mocked Auth.js `auth()` returns; set it with `actAs`. */
export const sessionStub: { current: { user: { id: string }; expires: string } | null } = { current: null };

export const demoUserId = (key: string) => `demo-user-${key}`;

export type Persona = "owner" | "designer" | "other" | "client" | "client2" | "otherclient" | "stone" | "joinery" | "anonymous";

export function actAs(persona: Persona) {
  sessionStub.current =
    persona === "anonymous" ? null : { user: { id: demoUserId(persona) }, expires: new Date(Date.now() + 3_600_000).toISOString() };
}
