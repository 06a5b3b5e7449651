"use client";
/** Starts an uncertainty job (POST /api/uncertainty), polls its status and fetches the stored result when it is done. */
import { useCallback, useEffect, useRef, useState } from "react";
import { getJson, postJson } from "../ui/apiClient";

export interface UncertaintyJobState {
  state: "idle" | "queued" | "running" | "done" | "failed" | "cancelled";
  done: number;
  total: number;
  stage: string;
  error: string | null;
  /** the stored result (GET resultApiUrl) when done */
  result: unknown;
  resultApiUrl: string | null;
}

/** What POST /api/uncertainty and the status URL answer. */
interface JobStatus {
  state: UncertaintyJobState["state"];
  done: number;
  total: number;
  stage: string;
  statusUrl: string;
  resultApiUrl: string;
  error?: { message: string };
}

const POLL_MS = 400;
const IDLE: UncertaintyJobState = {
  state: "idle",
  done: 0,
  total: 0,
  stage: "",
  error: null,
  result: null,
  resultApiUrl: null,
};

export function useUncertaintyJob() {
  const [job, setJob] = useState<UncertaintyJobState>(IDLE);
  const stop = useRef(false);
  useEffect(
    () => () => {
      stop.current = true;
    },
    [],
  );
  const start = useCallback(async (body: unknown) => {
    stop.current = false;
    setJob({ ...IDLE, state: "queued", stage: "queued" });
    try {
      let s = await postJson<JobStatus>("/api/uncertainty", body);
      while (!stop.current && (s.state === "queued" || s.state === "running")) {
        setJob((j) => ({ ...j, state: s.state, done: s.done, total: s.total, stage: s.stage }));
        await new Promise((res) => setTimeout(res, POLL_MS));
        s = await getJson<JobStatus>(s.statusUrl);
      }
      if (s.state !== "done") throw new Error(s.error?.message ?? `the job ended ${s.state}`);
      const res = await getJson<unknown>(s.resultApiUrl);
      setJob({
        state: "done",
        done: s.done,
        total: s.total,
        stage: "done",
        error: null,
        result: res,
        resultApiUrl: s.resultApiUrl,
      });
    } catch (e) {
      setJob((j) => ({ ...j, state: "failed", error: e instanceof Error ? e.message : String(e) }));
    }
  }, []);
  return { job, start };
}
