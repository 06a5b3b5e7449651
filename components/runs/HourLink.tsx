"use client";
/** Pick an hour of the run and open the explorer at that instant. */
import Link from "next/link";
import { useState } from "react";

export function HourLink({ runId, hours }: { runId: string; hours: number }) {
  const [hour, setHour] = useState(12);
  const h = Math.min(Math.max(0, Math.round(hour)), hours - 1);
  return (
    <span className="flex flex-wrap items-center gap-2 text-[13px]">
      <label className="flex items-center gap-1">
        Hour
        <input
          type="number"
          min={0}
          max={hours - 1}
          value={hour}
          aria-label="hour of the run"
          className="w-20 rounded border border-stone-300 px-2 py-0.5"
          onChange={(e) => setHour(Number(e.target.value))}
        />
      </label>
      <span className="text-stone-600">
        (day {Math.floor(h / 24) + 1}, {h % 24} h)
      </span>
      <Link className="underline" data-testid="open-hour" href={`/runs/${runId}/at/${h}`}>
        Open the explorer at this hour
      </Link>
    </span>
  );
}
