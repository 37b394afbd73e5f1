import { currentSessionVersion } from "@/db/queries/sessions";
import { actAs, sessionStub, type Persona, type StubSession } from "./session";

/**
 * A person's session sealed now, as if they had signed in at this moment, to come back to after
 * acting as someone else (actAs again would sign them in afresh with the current version).
 */
export async function holdSession(persona: Exclude<Persona, "anonymous">): Promise<StubSession> {
  actAs(persona);
  const session = sessionStub.current;
  if (!session) throw new Error("no session");
  session.sessionVersion = (await currentSessionVersion(session.user.id)) ?? 0;
  return session;
}

/** Carries on as the person whose session was held: their next request uses that old cookie. */
export function resumeSession(session: StubSession) {
  sessionStub.current = session;
}
