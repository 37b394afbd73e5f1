import { formatDay } from "@/lib/format";
import type { RevisionJson } from "@/lib/spec/revision-json";

type Props = { project: RevisionJson["project"]; contact: RevisionJson["contact"] };

/** Where the lines go, when they are installed, and whom to ask: what saves a supplier a phone call. */
export function RevisionFacts({ project, contact }: Props) {
  return (
    <dl className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
      <div>
        <dt className="text-sm text-ink-soft">Site address</dt>
        <dd className="font-medium">{project.siteAddress ?? "Not given yet: ask the studio"}</dd>
      </div>
      <div>
        <dt className="text-sm text-ink-soft">Install date</dt>
        <dd className="font-medium">{project.installDate ? formatDay(project.installDate) : "Not set yet"}</dd>
      </div>
      {contact && (
        <div className="sm:col-span-2">
          <dt className="text-sm text-ink-soft">Questions about these lines</dt>
          <dd className="flex flex-col">
            <span className="font-medium">
              {contact.name}, {contact.studioName}
            </span>
            <a href={`mailto:${contact.email}`} className="inline-flex min-h-tap items-center text-spruce underline underline-offset-4 break-all">
              {contact.email}
            </a>
            {contact.phone ? (
              <a href={`tel:${contact.phone.replace(/[^\d+]/g, "")}`} className="inline-flex min-h-tap items-center text-spruce underline underline-offset-4">
                {contact.phone}
              </a>
            ) : (
              <span className="text-ink-soft">No phone number given</span>
            )}
          </dd>
        </div>
      )}
    </dl>
  );
}
