"use client";

import { useEffect, useState } from "react";

const utc = new Intl.DateTimeFormat("en-AU", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
const local = new Intl.DateTimeFormat("en-AU", { day: "numeric", month: "short", year: "numeric", hour: "numeric", minute: "2-digit" });

/**
 * A moment in the reader's own time zone. The server doesn't know it, so the first render shows
 * the day (UTC) and the browser adds its local time after hydrating; nothing mismatches.
 */
export function When({ iso }: { iso: string }) {
  const [text, setText] = useState(() => utc.format(new Date(iso)));
  useEffect(() => setText(local.format(new Date(iso))), [iso]);
  return (
    <time dateTime={iso} className="figures">
      {text}
    </time>
  );
}
