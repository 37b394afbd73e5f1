import Link from "next/link";
import { cx } from "@/components/ui";

export type SpecGrouping = "room" | "supplier";

/** Two ways to read one schedule: as the rooms are built, or as each trade orders. */
export function ViewSwitch({ basePath, current }: { basePath: string; current: SpecGrouping }) {
  const items: { value: SpecGrouping; label: string }[] = [
    { value: "room", label: "By room" },
    { value: "supplier", label: "By supplier" },
  ];
  return (
    <nav aria-label="Group the specification" className="no-print">
      <ul className="inline-flex rounded-md border border-line-strong bg-card p-0.5">
        {items.map((item) => (
          <li key={item.value}>
            <Link
              href={item.value === "room" ? basePath : `${basePath}?view=supplier`}
              aria-current={current === item.value ? "page" : undefined}
              className={cx(
                "inline-flex min-h-tap items-center rounded px-4",
                current === item.value ? "bg-ink text-white" : "text-ink hover:bg-stone-100",
              )}
            >
              {item.label}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
