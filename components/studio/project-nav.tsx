"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

/** The tabs of one project. Each section's pages live under /studio/projects/[id]/<section>. */
export function ProjectNav({ projectId }: { projectId: string }) {
  const pathname = usePathname();
  const base = `/studio/projects/${projectId}`;
  const items = [
    { href: base, label: "Overview", exact: true },
    { href: `${base}/boards`, label: "Sample boards" },
    { href: `${base}/decisions`, label: "Decisions" },
    { href: `${base}/specification`, label: "Specification" },
    { href: `${base}/handoff`, label: "Supplier hand-off" },
    { href: `${base}/activity`, label: "Activity" },
  ];
  return (
    <nav aria-label="Project" className="no-print -mx-1 mb-8 overflow-x-auto border-b border-line">
      <ul className="flex min-w-max gap-1">
        {items.map((item) => {
          const active = item.exact ? pathname === item.href : pathname.startsWith(item.href);
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={active ? "page" : undefined}
                className={`inline-flex min-h-11 items-center border-b-2 px-3 ${
                  active ? "border-ink font-medium text-ink" : "border-transparent text-ink-soft hover:text-ink"
                }`}
              >
                {item.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
