import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { z } from "zod";

/**
 * The one reader of process.env. Every default works on a fresh clone: an embedded SQLite file,
 * the local mail catcher and a generated AUTH_SECRET kept in a gitignored file.
 */
const dataDir = path.resolve(process.cwd(), ".data");

const schema = z
  .object({
    MOTTLE_MODE: z.enum(["development", "demo", "test", "production"]).optional(),
    NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
    DATABASE_URL: z
      .string()
      .refine((v) => /^(file:|libsql:\/\/|https?:\/\/|wss?:\/\/)/.test(v), {
        message: "DATABASE_URL must be a file: URL or the libsql://, http(s):// or ws(s):// URL of a libSQL server",
      })
      .default(`file:${path.join(dataDir, "mottle.db")}`),
    DATABASE_AUTH_TOKEN: z.string().min(1).optional(),
    SMTP_URL: z.string().url().default("smtp://127.0.0.1:2525"),
    MAIL_FROM: z.string().min(3).default("Mottle <no-reply@mottle.example>"),
    MAIL_CATCHER_DIR: z.string().default(path.join(dataDir, "mail")),
    UPLOADS_DIR: z.string().default(path.resolve(process.cwd(), "uploads")),
    AUTH_SECRET: z.string().min(32).optional(),
    /** The public address every e-mailed link uses (scheme, host, port); required in production. */
    APP_URL: z
      .string()
      .url()
      .refine((v) => /^https?:\/\//.test(v), { message: "APP_URL must be an http:// or https:// address" })
      .optional(),
    PORT: z.coerce.number().int().min(1).max(65535).default(3000),
    /** How many proxies in front of Mottle add themselves to X-Forwarded-For; 0 trusts none (the socket address). */
    TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
  })
  .transform((raw) => {
    const mode = raw.MOTTLE_MODE ?? (raw.NODE_ENV === "production" ? "production" : raw.NODE_ENV);
    return { ...raw, MOTTLE_MODE: mode };
  });

export type Env = z.infer<typeof schema>;

function readOrCreateSecret(): string {
  const file = path.join(dataDir, "auth-secret");
  if (existsSync(file)) return readFileSync(file, "utf8").trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString("base64url");
  // wx: if two processes race, the loser's write fails and it reads the winner's secret.
  try {
    writeFileSync(file, secret, { flag: "wx", mode: 0o600 });
    return secret;
  } catch {
    return readFileSync(file, "utf8").trim();
  }
}

function loadEnv(): Env & { AUTH_SECRET: string } {
  const parsed = schema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Mottle cannot start: the environment is not valid.\n${lines}`);
  }
  const env = parsed.data;
  // `next build` evaluates this module too; the secret is only demanded of a running server.
  const building = process.env.NEXT_PHASE === "phase-production-build";
  if (env.MOTTLE_MODE === "production" && !env.AUTH_SECRET && !building) {
    throw new Error("Mottle cannot start: set AUTH_SECRET (at least 32 characters) in production.");
  }
  if (env.MOTTLE_MODE === "production" && !env.APP_URL && !building) {
    throw new Error("Mottle cannot start: set APP_URL to the public address people use (e.g. https://mottle.example.com) in production.");
  }
  const secret = env.AUTH_SECRET ?? readOrCreateSecret();
  // Auth.js reads AUTH_SECRET itself; keep it in step with what we resolved.
  process.env.AUTH_SECRET = secret;
  return { ...env, AUTH_SECRET: secret };
}

export const env = loadEnv();

/**
 * The one origin every link in an e-mail and every write's Origin is measured against: APP_URL,
 * else this server's own loopback address. Never taken from a request header (Host,
 * X-Forwarded-Host and Origin are the caller's to forge).
 */
export const publicOrigin = new URL(env.APP_URL ?? `http://127.0.0.1:${env.PORT}`).origin;
// Auth.js's own URL setting: with it, Auth.js builds sign-in links and its endpoints' URLs on this
// origin instead of trusting Host / X-Forwarded-Host (AUTH_TRUST_HOST then only lets it run).
process.env.AUTH_URL = publicOrigin;

/** The dev mail inbox and other conveniences exist only outside production. */
export const isDevLike = env.MOTTLE_MODE !== "production";
