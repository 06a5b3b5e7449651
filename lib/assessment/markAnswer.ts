/**
 * Marking one answer against its key entry with the stored tolerance:
 * numbers within the relative or absolute tolerance, names equal after
 * normalisation to the canonical answer or one of its accepted spellings.
 * All or nothing: a correct answer gets the question's points.
 */
import { normaliseName, parseNumberAnswer } from "./parseAnswer";
import type { KeyEntry, MarkCell, Tolerance } from "./types";

/** Whether `given` lies within the tolerance of `key` (an exact tolerance asks for equality). */
export function withinTolerance(given: number, key: number, t: Tolerance): boolean {
  const diff = Math.abs(given - key);
  if (t.kind === "relative") return diff <= t.rel * Math.abs(key) * (1 + 1e-12);
  if (t.kind === "absolute") return diff <= t.abs * (1 + 1e-12) + 1e-15;
  return given === key;
}

export function markAnswer(entry: KeyEntry, raw: string): MarkCell {
  const given = raw.trim();
  const base = { question: entry.question, given };
  if (given === "") return { ...base, status: "blank", mark: 0 };
  if (typeof entry.value === "number") {
    const v = parseNumberAnswer(given);
    if (v === null) return { ...base, status: "unreadable", mark: 0, note: `"${given}" is not a number` };
    const ok = withinTolerance(v, entry.value, entry.tolerance);
    return { ...base, status: ok ? "correct" : "incorrect", mark: ok ? entry.points : 0 };
  }
  const g = normaliseName(given);
  const ok = [entry.value, ...entry.accepted].some((a) => normaliseName(a) === g);
  return { ...base, status: ok ? "correct" : "incorrect", mark: ok ? entry.points : 0 };
}
