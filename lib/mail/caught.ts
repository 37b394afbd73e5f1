import { readdir, readFile } from "node:fs/promises";
import { join } from "node:path";
import { z } from "zod";

/** One e-mail as the local catcher stored it. */
export interface CaughtMessage {
  id: string;
  /** Envelope recipients, bare addresses. */
  to: string[];
  /** Sender address, without display name. */
  from: string;
  subject: string;
  text: string;
  html?: string;
  /** http(s) URLs from the text and the HTML hrefs, decoded, deduplicated, in order. */
  links: string[];
  /** ISO 8601 UTC. */
  receivedAt: string;
}

const caughtMessageSchema: z.ZodType<CaughtMessage> = z.object({
  id: z.string(),
  to: z.array(z.string()),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().optional(),
  links: z.array(z.string()),
  receivedAt: z.iso.datetime(),
});

export interface ReadCaughtMailOptions {
  to?: string;
  limit?: number;
}

export interface WaitForMailOptions {
  to: string;
  subjectIncludes?: string;
  after?: Date;
  timeoutMs?: number;
}

const POLL_INTERVAL_MS = 100;

async function readMessageFile(path: string): Promise<CaughtMessage | undefined> {
  try {
    const parsed = caughtMessageSchema.safeParse(JSON.parse(await readFile(path, "utf8")));
    return parsed.success ? parsed.data : undefined;
  } catch {
    // Garbled JSON, or the file vanished between readdir and read: not a message we can show.
    return undefined;
  }
}

async function listMessageFiles(dir: string): Promise<string[]> {
  try {
    // Dot-files are the catcher's half-written temporaries.
    return (await readdir(dir)).filter((name) => name.endsWith(".json") && !name.startsWith("."));
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return [];
    throw error;
  }
}

function isAddressedTo(message: CaughtMessage, address: string): boolean {
  const wanted = address.trim().toLowerCase();
  return message.to.some((to) => to.toLowerCase() === wanted);
}

/** Caught messages, newest first. A missing directory simply means nothing was caught yet. */
export async function readCaughtMail(dir: string, options: ReadCaughtMailOptions = {}): Promise<CaughtMessage[]> {
  const names = await listMessageFiles(dir);
  const entries = await Promise.all(
    names.map(async (name) => ({ name, message: await readMessageFile(join(dir, name)) })),
  );
  const messages = entries
    .filter((entry): entry is { name: string; message: CaughtMessage } => entry.message !== undefined)
    .filter((entry) => options.to === undefined || isAddressedTo(entry.message, options.to))
    .sort(
      (a, b) =>
        Date.parse(b.message.receivedAt) - Date.parse(a.message.receivedAt) ||
        (a.name < b.name ? 1 : a.name > b.name ? -1 : 0),
    )
    .map((entry) => entry.message);
  return options.limit === undefined ? messages : messages.slice(0, Math.max(0, options.limit));
}

function matchesWait(message: CaughtMessage, options: WaitForMailOptions): boolean {
  if (options.subjectIncludes !== undefined && !message.subject.includes(options.subjectIncludes)) return false;
  return options.after === undefined || Date.parse(message.receivedAt) >= options.after.getTime();
}

function describeTimeout(dir: string, options: WaitForMailOptions, timeoutMs: number, seen: CaughtMessage[]): string {
  const criteria = [
    `to ${options.to}`,
    options.subjectIncludes === undefined ? "" : `with subject containing "${options.subjectIncludes}"`,
    options.after === undefined ? "" : `received at or after ${options.after.toISOString()}`,
  ].filter(Boolean);
  const subjects = seen.slice(0, 5).map((m) => `"${m.subject}" at ${m.receivedAt}`);
  const found = seen.length === 0 ? "none caught for that address" : `caught for that address: ${subjects.join(", ")}`;
  return `waitForMail: no e-mail ${criteria.join(" ")} arrived in ${dir} within ${timeoutMs} ms (${found})`;
}

/** Polls the catcher's directory until a matching message arrives; for tests. */
export async function waitForMail(dir: string, options: WaitForMailOptions): Promise<CaughtMessage> {
  const timeoutMs = options.timeoutMs ?? 10_000;
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const candidates = await readCaughtMail(dir, { to: options.to });
    const match = candidates.find((message) => matchesWait(message, options));
    if (match) return match;
    if (Date.now() >= deadline) throw new Error(describeTimeout(dir, options, timeoutMs, candidates));
    await new Promise((resolve) => setTimeout(resolve, Math.min(POLL_INTERVAL_MS, deadline - Date.now())));
  }
}
