"use client";

const relative = new Intl.RelativeTimeFormat("en", { numeric: "auto" });
const absolute = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" });

const steps: [Intl.RelativeTimeFormatUnit, number][] = [
  ["second", 60],
  ["minute", 60],
  ["hour", 24],
  ["day", 7],
  ["week", 4.35],
  ["month", 12],
  ["year", Infinity],
];

export function relativeTime(iso: string, now = Date.now()): string {
  let amount = (new Date(iso).getTime() - now) / 1000;
  for (const [unit, size] of steps) {
    if (Math.abs(amount) < size) return unit === "second" && Math.abs(amount) < 45 ? "just now" : relative.format(Math.round(amount), unit);
    amount /= size;
  }
  return absolute.format(new Date(iso));
}

export function absoluteTime(iso: string): string {
  return absolute.format(new Date(iso));
}

/** When something happened: "3 hours ago", with the exact local date and time beside it. */
export function TimeStamp({ iso, layout = "stacked" }: { iso: string; layout?: "stacked" | "inline" }) {
  return (
    <time dateTime={iso} title={new Date(iso).toISOString()} className={layout === "stacked" ? "flex flex-col" : "inline"}>
      <span>{relativeTime(iso)}</span>
      <span className={`tabular text-xs text-ink-faint ${layout === "inline" ? "ml-2" : ""}`}>{absoluteTime(iso)}</span>
    </time>
  );
}
