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
};

export function describeAudit(action: string, detail: Detail): string {
  const phrase = phrases[action];
  if (phrase) return phrase(detail);
  const words = action.replace(/[._-]+/g, " ").trim();
  return words ? `${words}${quoted(detail, "title")}` : "did something";
}
