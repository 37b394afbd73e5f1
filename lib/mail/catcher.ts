import { randomBytes } from "node:crypto";
import { mkdir, rename, rm, writeFile } from "node:fs/promises";
import type { AddressInfo } from "node:net";
import { join } from "node:path";
import { simpleParser } from "mailparser";
import type { AddressObject, ParsedMail } from "mailparser";
import { SMTPServer } from "smtp-server";
import type { SMTPServerDataStream, SMTPServerError, SMTPServerSession } from "smtp-server";
import type { CaughtMessage } from "./caught";
import { extractLinks } from "./extract-links";

export interface MailCatcherOptions {
  /** 0 picks a free port; the chosen one is returned. */
  port: number;
  host?: string;
  /** Directory that receives one JSON file per message. */
  dir: string;
}

export interface MailCatcher {
  port: number;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;
// Senders here are local and disconnect after each message, so a short grace period suffices
// and keeps test teardown fast.
const CLOSE_TIMEOUT_MS = 2_000;

let sequence = 0;

// Timestamp first so names sort by arrival; the sequence breaks ties within one millisecond.
function createMessageId(receivedAt: Date): string {
  sequence += 1;
  const stamp = receivedAt.toISOString().replace(/[-:.]/g, "");
  return `${stamp}-${String(sequence).padStart(6, "0")}-${randomBytes(3).toString("hex")}`;
}

function listHeaderAddresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const objects = field === undefined ? [] : Array.isArray(field) ? field : [field];
  return objects
    .flatMap((object) => object.value)
    .flatMap((entry) => [entry, ...(entry.group ?? [])])
    .flatMap((entry) => (entry.address ? [entry.address] : []));
}

function toCaughtMessage(mail: ParsedMail, session: SMTPServerSession, id: string, receivedAt: Date): CaughtMessage {
  // The envelope is what was actually delivered (Bcc included); headers are only a fallback.
  const envelopeTo = session.envelope.rcptTo.map((rcpt) => rcpt.address);
  const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
  const text = mail.text ?? "";
  const html = typeof mail.html === "string" ? mail.html : undefined;
  return {
    id,
    to: envelopeTo.length > 0 ? envelopeTo : listHeaderAddresses(mail.to),
    from: listHeaderAddresses(mail.from)[0] ?? envelopeFrom,
    subject: mail.subject ?? "",
    text,
    ...(html === undefined ? {} : { html }),
    links: extractLinks(text, html),
    receivedAt: receivedAt.toISOString(),
  };
}

// Readers list only visible *.json files, so they never see a partial write.
async function writeAtomically(dir: string, message: CaughtMessage): Promise<void> {
  await mkdir(dir, { recursive: true });
  const finalPath = join(dir, `${message.id}.json`);
  const tmpPath = join(dir, `.${message.id}.json.tmp`);
  try {
    await writeFile(tmpPath, `${JSON.stringify(message, null, 2)}\n`, "utf8");
    await rename(tmpPath, finalPath);
  } catch (error) {
    await rm(tmpPath, { force: true });
    throw error;
  }
}

function createOversizeError(): SMTPServerError {
  return Object.assign(new Error("Message exceeds the catcher's 10 MB limit"), { responseCode: 552 });
}

async function catchMessage(stream: SMTPServerDataStream, session: SMTPServerSession, dir: string): Promise<void> {
  const receivedAt = new Date();
  const id = createMessageId(receivedAt);
  const mail = await simpleParser(stream);
  if (stream.sizeExceeded) throw createOversizeError();
  await writeAtomically(dir, toCaughtMessage(mail, session, id, receivedAt));
}

function toError(error: unknown): Error {
  return error instanceof Error ? error : new Error(String(error));
}

/** Starts a local SMTP server that stores every message it receives as JSON in `dir`. */
export async function startMailCatcher({ port, host = "127.0.0.1", dir }: MailCatcherOptions): Promise<MailCatcher> {
  await mkdir(dir, { recursive: true });
  const server = new SMTPServer({
    // The bundled certificate has expired and this is a plaintext, local-only catcher.
    disabledCommands: ["STARTTLS", "AUTH"],
    authOptional: true,
    size: MAX_MESSAGE_BYTES,
    rejectOversized: true,
    disableReverseLookup: true,
    closeTimeout: CLOSE_TIMEOUT_MS,
    logger: false,
    onData(stream, session, callback) {
      catchMessage(stream, session, dir).then(
        () => callback(),
        (error: unknown) => callback(toError(error)),
      );
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  // A broken client connection must not crash the dev server or the test run.
  server.on("error", () => undefined);

  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
