"use client";
/**
 * For the profile and comparison views: runs Monte Carlo ranges over every
 * level of a stored sweep as a job with progress, then draws the family-share
 * bands against altitude and lists the levels without ranges.
 */
import { useState } from "react";
import type { ProfileBand } from "@/lib/uncertainty/bandSeries";
import type { SensitivityReport } from "@/lib/uncertainty/types";
import { JobBar } from "./JobBar";
import { ProfileShareBandsChart } from "./ProfileShareBandsChart";
import { SensitivityAltitudeTable } from "./SensitivityAltitudeTable";
import { useUncertaintyJob } from "./useUncertaintyJob";

interface Stored {
  body: {
    samples: number;
    bands: ProfileBand[];
    levels: { altitude_km: number; status: string; message: string; sensitivity: SensitivityReport | null }[];
  };
}

export function ProfileUncertaintyRunner({ profileId, label = "" }: { profileId: string; label?: string }) {
  const { job, start } = useUncertaintyJob();
  const [samples, setSamples] = useState(200);
  const [withSensitivity, setWithSensitivity] = useState(false);
  const stored = job.result as Stored | null;
  const busy = job.state === "queued" || job.state === "running";
  const missing = stored?.body.levels.filter((l) => l.status !== "ok") ?? [];
  return (
    <div data-testid="profile-uncertainty-runner" className="space-y-1 text-[11px]">
      <form
        className="flex items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          void start({ profileId, samples, seed: 1, sensitivity: withSensitivity });
        }}
      >
        <label className="flex flex-col">
          samples per level
          <input
            type="number"
            min={1}
            max={100000}
            value={samples}
            onChange={(e) => setSamples(Number(e.target.value))}
            className="w-20 rounded border border-stone-300 px-1"
          />
        </label>
        <label className="flex items-center gap-1">
          <input type="checkbox" checked={withSensitivity} onChange={(e) => setWithSensitivity(e.target.checked)} />
          sensitivities
        </label>
        <button
          type="submit"
          disabled={busy}
          className="rounded border border-stone-400 px-2 py-0.5 disabled:opacity-50"
        >
          Kinetic uncertainty bands{label ? ` (${label})` : ""}
        </button>
      </form>
      <JobBar job={job} />
      {stored && (
        <>
          <ProfileShareBandsChart
            bands={stored.body.bands}
            title={`Family shares with 5–95 % ranges over ${stored.body.samples} samples per level`}
          />
          {stored.body.levels.some((l) => l.sensitivity) && <SensitivityAltitudeTable levels={stored.body.levels} />}
          {missing.length > 0 && (
            <p className="text-stone-600">
              No ranges at {missing.map((l) => `${l.altitude_km} km (${l.status})`).join(", ")}
            </p>
          )}
        </>
      )}
    </div>
  );
}
