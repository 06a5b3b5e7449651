import { type APIRequestContext, expect, test } from "@playwright/test";

// Route tests of the assessment builder against the really started production server (playwright.config.ts).
// The teaching mechanism's chlorine cycle id is the sorted reaction ids of lib/mechanisms/oxygen-chlorine.yaml.

const CL_CYCLE = "Cl1+Cl2";
const spec = {
  title: "Route test: chlorine catalysis",
  mechanismId: "oxygen-chlorine",
  variants: 10,
  seed: 8675309,
  base: { altitude_km: 35, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 },
  ranges: {
    altitude_km: { min: 25, max: 48 },
    localSolarTime_h: { min: 9, max: 15 },
    poolTotals: { Cly: { min: 1.5e-9, max: 3.5e-9 } },
  },
  questions: [
    { kind: "dominant-family" },
    { kind: "rate-limiting-step", cycleId: CL_CYCLE },
    { kind: "chain-length", cycleId: CL_CYCLE },
    { kind: "species-ratio", speciesA: "ClO", speciesB: "Cl" },
    { kind: "clox-share-change", points: 2 },
    { kind: "ozone-per-catalyst", cycleId: CL_CYCLE },
  ],
};

interface Key {
  variant: number;
  question: number;
  value: number | string;
  display: string;
  accepted: string[];
  unit: string;
}
interface Created {
  instructorId: string;
  studentId: string;
  instructorUrl: string;
  studentUrl: string;
  assessment: {
    key: Key[];
    variants: { number: number; seed: number; condition: unknown }[];
    analyses: { analysisId: string }[];
  };
}

let created: Created;

async function create(request: APIRequestContext, body: unknown = spec) {
  const r = await request.post("/api/assessments", { data: body });
  return { status: r.status(), body: await r.json() };
}

/**
 * Strings that would give an answer away: numbers in full precision and as printed on the key.
 * A printed value of four characters or fewer ("400", "2.1") is left out of this list: it is found by
 * chance in class names, chunk names and the printed conditions. Those answers are checked where they
 * would be written instead: every answer line of a student sheet must be blank (`answerLines`).
 */
function secrets(c: Created): string[] {
  const out = [c.instructorId, '"accepted"', '"tolerance"', '"key"', ...c.assessment.analyses.map((a) => a.analysisId)];
  for (const k of c.assessment.key)
    if (typeof k.value === "number") out.push(String(k.value), k.value.toPrecision(8), k.display);
  return out.filter((x) => x.length > 4);
}

/** The text after each "Answer:" on the rendered sheets, up to the end of its paragraph, without tags and unit words. */
function answerLines(html: string): string[] {
  return [...html.matchAll(/Answer: (.*?)<\/p>/g)].map((m) => m[1].replace(/<[^>]*>/g, "").trim());
}

test.describe.configure({ mode: "serial" });

test.describe("assessment routes", () => {
  test.beforeAll(async ({ request }) => {
    const r = await create(request);
    expect(r.status).toBe(201);
    created = r.body;
  });

  test("building an assessment stores an instructor record and a student record under two unguessable ids", async () => {
    expect(created.instructorId).toMatch(/^[A-Za-z0-9_-]{16}$/);
    expect(created.studentId).toMatch(/^[A-Za-z0-9_-]{16}$/);
    expect(created.studentId).not.toBe(created.instructorId);
    expect(created.instructorUrl).toBe(`/assess/i/${created.instructorId}`);
    expect(created.studentUrl).toBe(`/assess/s/${created.studentId}`);
    expect(created.assessment.key).toHaveLength(60);
    expect(created.assessment.variants.map((v) => v.number)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  });

  test("the instructor routes give the key as JSON and CSV", async ({ request }) => {
    const rec = await (await request.get(`/api/assessments/${created.instructorId}`)).json();
    expect(rec.key).toEqual(created.assessment.key);
    const csv = await request.get(`/api/assessments/${created.instructorId}/key.csv?comments=none`);
    expect(csv.headers()["content-type"]).toContain("text/csv");
    const lines = (await csv.text()).trim().split("\r\n");
    expect(lines[0]).toBe("variant,variant_seed,question,kind,answer,answer_display,unit,tolerance,accepted,points");
    expect(lines).toHaveLength(61);
    const json = await request.get(`/api/assessments/${created.instructorId}/key.json`);
    expect(json.headers()["content-disposition"]).toContain("attachment");
    const key = await json.json();
    expect(key.seed).toBe(8675309);
    expect(key.variants).toHaveLength(10);
    expect(key.variants[0].answers).toHaveLength(6);
    const blank = await (
      await request.get(`/api/assessments/${created.instructorId}/answers-template.csv?comments=none`)
    ).text();
    expect(blank.split("\r\n")[0]).toBe("student,variant,q1,q2,q3,q4,q5,q6");
  });

  test("the student JSON route has the sheets and never an answer", async ({ request }) => {
    const r = await request.get(`/api/assessments/student/${created.studentId}`);
    expect(r.status()).toBe(200);
    const text = await r.text();
    const body = JSON.parse(text);
    expect(Object.keys(body).sort()).toEqual([
      "createdAt",
      "instructions",
      "mechanism",
      "sheets",
      "studentId",
      "title",
    ]);
    expect(body.sheets).toHaveLength(10);
    for (const s of secrets(created)) expect(text, s).not.toContain(s);
  });

  test("the student page's HTML has the sheets and never an answer", async ({ request }) => {
    for (const url of [created.studentUrl, `${created.studentUrl}?v=3`]) {
      const r = await request.get(url);
      expect(r.status()).toBe(200);
      const html = await r.text();
      expect(html).toContain("Variant 3");
      for (const s of secrets(created)) expect(html, `${url}: ${s}`).not.toContain(s);
      const lines = answerLines(html);
      expect(lines.length, url).toBeGreaterThanOrEqual(6);
      const printed = new Set(created.assessment.key.map((k) => k.display));
      for (const line of lines)
        for (const word of line.split(/\s+/)) expect(printed.has(word), `${url}: "${line}"`).toBe(false);
    }
  });

  test("the student id opens no instructor route, and the instructor id no student route", async ({ request }) => {
    const s = created.studentId;
    for (const url of [
      `/api/assessments/${s}`,
      `/api/assessments/${s}/key.csv`,
      `/api/assessments/${s}/key.json`,
      `/api/assessments/${s}/answers-template.csv`,
    ]) {
      const r = await request.get(url);
      expect(r.status(), url).toBe(404);
      expect((await r.json()).error.code).toBe("not-found");
    }
    const marks = await request.post(`/api/assessments/${s}/marks`, {
      data: "student,variant,q1\n",
      headers: { "content-type": "text/csv" },
    });
    expect(marks.status()).toBe(404);
    expect((await request.get(`/assess/i/${s}`)).status()).toBe(404);
    expect((await request.get(`/api/assessments/student/${created.instructorId}`)).status()).toBe(404);
    expect((await request.get(`/assess/s/${created.instructorId}`)).status()).toBe(404);
  });

  test("the same seed builds the same variants and answers under new ids", async ({ request }) => {
    const again = (await create(request)).body as Created;
    expect(again.instructorId).not.toBe(created.instructorId);
    expect(again.assessment.variants).toEqual(created.assessment.variants);
    expect(again.assessment.key).toEqual(created.assessment.key);
  });

  test("each answer agrees with an analysis of the variant's condition through the analyses route", async ({
    request,
  }) => {
    for (const v of created.assessment.variants.slice(0, 3)) {
      const r = await (
        await request.post("/api/analyses", { data: { mechanismId: "oxygen-chlorine", condition: v.condition } })
      ).json();
      const k = (q: number) => created.assessment.key.find((e) => e.variant === v.number && e.question === q)?.value;
      const cycle = r.result.cycles.cycles.find((c: { id: string }) => c.id === CL_CYCLE);
      expect(k(2)).toBe(cycle.rateLimitingStep);
      expect(k(3)).toBe(cycle.chainLength);
      const n = (id: string) => r.result.steadyState.species.find((s: { id: string }) => s.id === id).numberDensity_cm3;
      expect(k(4)).toBe(n("ClO") / n("Cl"));
    }
  });

  test("a hand-made answer file is marked per question and per student, as JSON and as CSV", async ({ request }) => {
    const key = (v: number, q: number) =>
      created.assessment.key.find((e) => e.variant === v && e.question === q) as Key;
    const num = (v: number, q: number, factor: number) => String((key(v, q).value as number) * factor);
    // Ada: all right (letters and 3 s.f. numbers). Ben: q1 wrong family, q3 30 % off (tolerance 10 %), rest blank.
    const ada = [
      key(1, 1).accepted[0],
      key(1, 2).accepted[0],
      num(1, 3, 1.004),
      num(1, 4, 0.98),
      num(1, 5, 1),
      num(1, 6, 1.05),
    ];
    const wrongFamily = key(2, 1).value === "Ox" ? "ClOx" : "Ox";
    const ben = [wrongFamily, key(2, 2).value as string, num(2, 3, 1.3), "", "", ""];
    const csv = ["student,variant,q1,q2,q3,q4,q5,q6", `Ada,1,${ada.join(",")}`, `Ben,2,${ben.join(",")}`].join("\n");
    const r = await request.post(`/api/assessments/${created.instructorId}/marks`, {
      data: csv,
      headers: { "content-type": "text/csv" },
    });
    expect(r.status()).toBe(200);
    const m = await r.json();
    expect(
      m.students.map((s: { student: string; total: number; outOf: number }) => [s.student, s.total, s.outOf]),
    ).toEqual([
      ["Ada", 7, 7],
      ["Ben", 1, 7],
    ]);
    expect(m.students[1].cells.map((c: { status: string }) => c.status)).toEqual([
      "incorrect",
      "correct",
      "incorrect",
      "blank",
      "blank",
      "blank",
    ]);
    expect(m.questions.map((q: { correct: number }) => q.correct)).toEqual([1, 2, 1, 1, 1, 1]);
    const asCsv = await request.post(`/api/assessments/${created.instructorId}/marks?format=csv&comments=none`, {
      data: csv,
      headers: { "content-type": "text/csv" },
    });
    expect(asCsv.headers()["content-type"]).toContain("text/csv");
    const lines = (await asCsv.text()).trim().split("\r\n");
    expect(lines[0].startsWith("student,variant,q1,q2,q3,q4,q5,q6,total,out_of")).toBe(true);
    expect(lines[1].startsWith("Ada,1,1,1,1,1,2,1,7,7")).toBe(true);
  });

  test("the answers may also come as JSON { csv }, and a body over 1 MiB is refused", async ({ request }) => {
    const csv = "student,variant,q1,q2,q3,q4,q5,q6\nAda,1,,,,,,\n";
    const r = await request.post(`/api/assessments/${created.instructorId}/marks`, { data: { csv } });
    expect(r.status()).toBe(200);
    expect((await r.json()).students[0].total).toBe(0);
    const big = await request.post(`/api/assessments/${created.instructorId}/marks`, {
      data: `student,variant,q1,q2,q3,q4,q5,q6\n${"x".repeat(1_100_000)}`,
      headers: { "content-type": "text/csv" },
    });
    expect(big.status()).toBe(413);
  });

  test("a malformed answer file is a 400 naming the row and the column", async ({ request }) => {
    const r = await request.post(`/api/assessments/${created.instructorId}/marks`, {
      data: "student,variant,q1,q2,q3,q4,q5,q6\nAda,11,a,a,1,1,1,1\n",
      headers: { "content-type": "text/csv" },
    });
    expect(r.status()).toBe(400);
    const { error } = await r.json();
    expect(error.path).toBe("row 2, column variant");
    expect(error.message).toContain("not a variant of this assessment (1–10)");
  });

  test("a bad request is a 400 naming the field, and an unknown mechanism a 404", async ({ request }) => {
    const cases: [unknown, string][] = [
      [{ ...spec, variants: 0 }, "variants"],
      [{ ...spec, questions: [{ kind: "chain-length" }] }, "questions[0].cycleId"],
      [{ ...spec, questions: [{ kind: "species-ratio", speciesA: "BrO", speciesB: "Cl" }] }, "questions[0].speciesA"],
      [{ ...spec, questions: [{ kind: "chain-length", cycleId: "no-such-cycle" }] }, "questions[0]"],
      [{ ...spec, ranges: { altitude_km: { min: 50, max: 20 } } }, "ranges.altitude_km"],
    ];
    for (const [body, path] of cases) {
      const r = await create(request, body);
      expect(r.status, path).toBe(400);
      expect(r.body.error.path, path).toBe(path);
    }
    expect((await create(request, { ...spec, mechanismId: "no-such-mechanism" })).status).toBe(404);
  });

  test("the preview lists the cycles and species at the base condition", async ({ request }) => {
    const r = await request.post("/api/assessments/preview", {
      data: { mechanismId: "oxygen-chlorine", condition: { altitude_km: 35 } },
    });
    expect(r.status()).toBe(200);
    const p = await r.json();
    expect(p.cycles.map((c: { id: string }) => c.id)).toContain(CL_CYCLE);
    expect(p.solvedSpecies).toEqual(expect.arrayContaining(["Cl", "ClO", "O"]));
    expect(p.pools).toEqual(["Cly"]);
  });

  test("the OpenAPI document lists the assessment routes", async ({ request }) => {
    const doc = await (await request.get("/api/openapi.json")).json();
    for (const p of [
      "/api/assessments",
      "/api/assessments/{id}",
      "/api/assessments/{id}/marks",
      "/api/assessments/student/{id}",
    ])
      expect(Object.keys(doc.paths)).toContain(p);
  });
});
