import { describe, expect, test } from "vitest";
import { answerTemplateCsv, keyCsv, keyJson, readCsv, studentView } from "@/lib/assessment";
import { instructorRecord } from "./instructorRecord";

describe("the student view", () => {
  test("carries no answer, key, tolerance, seed, analysis id or instructor id", async () => {
    const a = await instructorRecord();
    const json = JSON.stringify(studentView(a));
    for (const word of [
      "INSTRUCTORxxxxxx",
      "ANALYSISzzzzzzzz",
      '"key"',
      "accepted",
      "tolerance",
      "display",
      "seed",
      "rateLimitingStep",
    ])
      expect(json).not.toContain(word);
    for (const k of a.key.filter((e) => typeof e.value === "number")) {
      expect(json).not.toContain(String(k.value));
      expect(json).not.toContain(k.display);
    }
    expect(Object.keys(studentView(a)).sort()).toEqual([
      "createdAt",
      "instructions",
      "mechanism",
      "sheets",
      "studentId",
      "title",
    ]);
  });

  test("still has every question of every variant with its conditions", async () => {
    const a = await instructorRecord();
    const s = studentView(a);
    expect(s.sheets).toHaveLength(10);
    expect(s.sheets.every((x) => x.questions.length === 6 && x.conditions.length > 3)).toBe(true);
    expect(s.sheets).toEqual(a.sheets);
  });
});

describe("the key exports", () => {
  test("list every answer once in the CSV, with its unit and tolerance, in full precision", async () => {
    const a = await instructorRecord();
    const rows = readCsv(keyCsv(a));
    expect(rows[0]).toEqual([
      "variant",
      "variant_seed",
      "question",
      "kind",
      "answer",
      "answer_display",
      "unit",
      "tolerance",
      "accepted",
      "points",
    ]);
    expect(rows).toHaveLength(61);
    const q3 = rows.find((r) => r[0] === "1" && r[2] === "3") as string[];
    const k3 = a.key.find((k) => k.variant === 1 && k.question === 3) as (typeof a.key)[number];
    expect(Number(q3[4])).toBe(Number((k3.value as number).toPrecision(8)));
    expect(q3[6]).toBe("turnovers");
    expect(q3[7]).toBe("± 10.0 %");
    expect(rows.find((r) => r[2] === "1")?.[7]).toBe("exact");
  });

  test("group the answers by variant in the JSON, with the seed to reproduce them", async () => {
    const a = await instructorRecord();
    const j = keyJson(a);
    expect(j.seed).toBe(4242);
    expect(j.variants).toHaveLength(10);
    expect(j.variants[0].answers).toHaveLength(6);
    expect(j.variants[0].condition).toEqual(a.variants[0].condition);
  });

  test("offer a blank answer file with one row per variant", () => {
    expect(readCsv(answerTemplateCsv(3, 2))).toEqual([
      ["student", "variant", "q1", "q2", "q3"],
      ["", "1", "", "", ""],
      ["", "2", "", "", ""],
    ]);
  });
});
