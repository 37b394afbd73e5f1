import { formatDay } from "@/lib/format";

/** The project's activity log in plain words. Unknown actions (other areas add their own) fall back to their name. */

type Detail = Record<string, unknown> | null | undefined;

const text = (detail: Detail, key: string): string | null => {
  const v = detail?.[key];
  return typeof v === "string" && v.trim() ? v : null;
};

const quoted = (detail: Detail, key: string) => {
  const v = text(detail, key);
  return v ? ` “${v}”` : "";
};

const letter = (detail: Detail) => (text(detail, "letter") ? ` ${text(detail, "letter")}` : "");

const phrases: Record<string, (d: Detail) => string> = {
  "project.created": () => "created the project",
  "client.invited": (d) => `invited a client${text(d, "email") ? ` (${text(d, "email")})` : ""}`,
  "supplier.invited": (d) => `invited a supplier's contact${text(d, "email") ? ` (${text(d, "email")})` : ""}`,
  "invitation.accepted": (d) => `accepted the invitation to join as ${text(d, "role") === "supplier" ? "a supplier's contact" : "a client"}`,
  "invitation.declined": () => "declined the invitation to the project",
  "decision.created": (d) => `opened the decision${quoted(d, "title")}`,
  "decision.updated": (d) => `changed the decision${quoted(d, "title")}`,
  "decision.sent": (d) => `sent the decision${quoted(d, "title")} to the clients`,
  "option.chosen": (d) => `picked${quoted(d, "option")} for${quoted(d, "title")}${text(d, "comment") ? `, saying “${text(d, "comment")}”` : ""}`,
  "decision.approved": (d) => `approved${quoted(d, "option")} for${quoted(d, "title")}, which locked it`,
  "variation.requested": (d) => `asked for a variation to${quoted(d, "title")}${quoted(d, "reason") ? `:${quoted(d, "reason")}` : ""}`,
  "variation.priced": (d) => `priced a variation to${quoted(d, "title")}`,
  "variation.approved": (d) => `approved a variation to${quoted(d, "title")}${quoted(d, "option") ? `, which now carries${quoted(d, "option")}` : ""}`,
  "variation.declined": (d) => `declined a variation to${quoted(d, "title")}`,
  "variation.withdrawn": (d) => `withdrew a variation to${quoted(d, "title")}`,
  "project.updated": () => "changed the project's details",
  "room.added": (d) => `added the room${quoted(d, "title")}`,
  "room.renamed": (d) => `renamed the room${quoted(d, "from")} to${quoted(d, "title")}`,
  "room.moved": (d) => `moved the room${quoted(d, "title")} in the list`,
  "room.removed": (d) => `removed the room${quoted(d, "title")}`,
  "member.role_changed": (d) => `made ${text(d, "name") ?? "someone"} ${text(d, "to") === "client" ? "a client" : `the ${text(d, "to") ?? "contact at a supplier"}`}`,
  "member.removed": (d) => `took ${text(d, "name") ?? "someone"} off the project`,
  "invitation.withdrawn": (d) => `withdrew the invitation${text(d, "email") ? ` to ${text(d, "email")}` : ""}`,
  "account.updated": () => "changed their own name or phone",
  "account.password_set": () => "set a password",
  "account.password_changed": () => "changed their password",
  "decision.repriced": (d) => `changed a price on${quoted(d, "title")}`,
  "revision.issued": (d) => `issued revision${letter(d)} of the specification`,
  "revision.acknowledged": (d) => `acknowledged revision${letter(d)}`,
  "line.order-dates": (d) =>
    `recorded${text(d, "orderedOn") ? ` an order placed ${formatDay(text(d, "orderedOn"))}` : " order dates"} for${quoted(d, "item")}${text(d, "letter") ? ` (revision ${text(d, "letter")})` : ""}${
      text(d, "expectedOn") ? `, expected ${formatDay(text(d, "expectedOn"))}` : ""
    }`,
  "line.confirmed": (d) => `confirmed that${quoted(d, "item")} in revision${letter(d)} stands as issued${text(d, "note") ? `: “${text(d, "note")}”` : ""}`,
  "fixed-item.added": (d) => `added the fixed item${quoted(d, "item")}`,
  "fixed-item.changed": () => "changed a fixed item",
  "fixed-item.removed": (d) => `removed the fixed item${quoted(d, "item")}`,
  "board.created": (d) => `started the sample board${quoted(d, "name")}`,
  "board.duplicated": (d) => `copied a sample board${quoted(d, "name") ? ` as${quoted(d, "name")}` : ""}`,
  "image.uploaded": () => "uploaded a photo",
};

type Part = { action: string; detail: Detail };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function joinWords(words: string[]): string {
  if (words.length <= 1) return words[0] ?? "";
  return `${words.slice(0, -1).join(", ")} and ${words[words.length - 1]}`;
}

/** A run of one person's saves on one board, in a few words: "moved 3 swatches and added 1 swatch on “Kitchen”". */
export function describeBoardEdits(parts: readonly Part[]): string {
  const distinct = (filter: (p: Part) => boolean) => new Set(parts.filter(filter).map((p) => text(p.detail, "itemId") ?? text(p.detail, "pairId") ?? "")).size;
  const changed = (kind: string) => (p: Part) => p.action === "board.item-changed" && Array.isArray(p.detail?.changes) && p.detail.changes.includes(kind);
  const count = (action: string) => parts.filter((p) => p.action === action).length;
  const words = [
    [count("board.item-added"), "added", "swatch", "swatches"],
    [distinct(changed("moved")), "moved", "swatch", "swatches"],
    [distinct(changed("resized")), "resized", "swatch", "swatches"],
    [distinct(changed("renamed")), "renamed", "swatch", "swatches"],
    [count("board.item-removed"), "removed", "swatch", "swatches"],
    [count("board.pair-added"), "paired", "two swatches", "pairs of swatches"],
    [distinct((p) => p.action === "board.pair-changed"), "changed", "pair", "pairs"],
    [count("board.pair-removed"), "unpaired", "two swatches", "pairs of swatches"],
  ] as const;
  const said = words.filter(([n]) => n > 0).map(([n, verb, one, many]) => (one === "two swatches" && n === 1 ? `${verb} two swatches` : `${verb} ${plural(n, one, many)}`));
  if (parts.some((p) => p.action === "board.items-reordered")) said.push("changed which swatch sits on top");
  const board = parts.map((p) => text(p.detail, "board")).findLast((b) => b !== null);
  return `${said.length ? joinWords(said) : "changed"}${board ? ` on “${board}”` : " a sample board"}`;
}

export function describeAudit(action: string, detail: Detail, parts: readonly Part[] = []): string {
  if (action === "board.edits" || action.startsWith("board.item-") || action.startsWith("board.pair-") || action === "board.items-reordered") {
    return describeBoardEdits(parts.length ? parts : [{ action, detail }]);
  }
  const phrase = phrases[action];
  if (phrase) return phrase(detail);
  const words = action.replace(/[._-]+/g, " ").trim();
  return words ? `${words}${quoted(detail, "title")}` : "did something";
}
