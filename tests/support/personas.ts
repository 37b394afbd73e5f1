import { encode } from "next-auth/jwt";

/** Everyone the permission matrix acts as: each role, its outsider twin, and nobody. */
export const PERSONAS = ["owner", "designer", "other", "client", "otherclient", "stone", "joinery", "anonymous"] as const;
export type MatrixPersona = (typeof PERSONAS)[number];

export const PERSONA_LABELS: Record<MatrixPersona, string> = {
  owner: "owner",
  designer: "designer",
  other: "other studio's designer",
  client: "client",
  otherclient: "another project's client",
  stone: "supplier",
  joinery: "another supplier",
  anonymous: "anonymous",
};

/**
 * A session cookie as Auth.js would set it for a demo user (the test server's AUTH_SECRET signs it),
 * sealed with session version 0: the seeded version, until that person signs out (db/queries/sessions.ts).
 */
export async function cookieFor(persona: MatrixPersona, secret: string): Promise<string | undefined> {
  if (persona === "anonymous") return undefined;
  const name = "authjs.session-token";
  const value = await encode({
    token: { sub: `demo-user-${persona}`, email: `${persona}@demo.example`, sessionVersion: 0 },
    secret,
    salt: name,
    maxAge: 3600,
  });
  return `${name}=${value}`;
}
