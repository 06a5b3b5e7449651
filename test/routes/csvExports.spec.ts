import { type APIRequestContext, expect, test } from "@playwright/test";
import { readCsv, withoutCsvComments } from "../../lib/csv";
import { finish } from "./finishJob";

// Every CSV export starts with its provenance block of `# key: value` lines (DEVELOPERS.md, "CSV exports").
// A reader that skips '#' lines (pandas comment="#", R comment.char = "#") is imitated by dropping them and
// parsing with lib/csv; `?comments=none` must give exactly that table.

/** The `# key: value` entries of the block at the top of a CSV text. */
function block(text: string): Map<string, string> {
  const out = new Map<string, string>();
  for (const line of text.split("\r\n")) {
    if (!line.startsWith("#")) break;
    const m = /^# ([a-z][a-z0-9-]*): (.*)$/.exec(line);
    expect(m, `comment line "${line}"`).not.toBeNull();
    out.set((m as RegExpExecArray)[1], (m as RegExpExecArray)[2]);
  }
  return out;
}

async function checkExport(request: APIRequestContext, url: string, keys: string[]) {
  const full = await request.get(url);
  expect(full.status(), url).toBe(200);
  const text = await full.text();
  const bare = await (await request.get(`${url}?comments=none`)).text();
  const entries = block(text);
  const file = url.split("/").pop() as string;
  expect(entries.get("table")?.startsWith(`${file}:`), `${url} names its table`).toBe(true);
  for (const k of ["engine-version", "computed-at", "permalink", "caution", "bare-table", ...keys])
    expect(entries.get(k), `${url} has "# ${k}:"`).toBeTruthy();
  expect(entries.get("caution")).toContain("not for regulatory reporting");
  expect(entries.get("permalink")).toMatch(/^http:\/\/127\.0\.0\.1:\d+\//);
  // the bare table is exactly what a '#'-skipping reader sees, and it parses to the same rows
  expect(bare).toBe(withoutCsvComments(text));
  expect(bare.startsWith("#")).toBe(false);
  expect(readCsv(withoutCsvComments(text))).toEqual(readCsv(bare));
  expect(readCsv(bare).length).toBeGreaterThan(1);
  return { text, bare, entries };
}

test.describe("CSV exports", () => {
  test("an analysis's CSVs start with the mechanism, the resolved condition and the permalink; ?comments=none is the bare table", async ({
    request,
  }) => {
    const created = await (
      await request.post("/api/analyses", {
        data: {
          mechanismId: "oxygen-chlorine",
          condition: { altitude_km: 40, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 },
          options: { uncertaintySamples: 20, sensitivity: true },
        },
      })
    ).json();
    const id = created.id;
    for (const file of ["rates.csv", "species.csv", "cycles.csv", "uncertainty.csv", "sensitivities.csv"]) {
      const { entries } = await checkExport(request, `/api/analyses/${id}/${file}`, [
        "mechanism-id",
        "mechanism-title",
        "mechanism-version",
        "condition",
        "pool-totals-cm3",
        "record",
      ]);
      expect(entries.get("mechanism-id")).toBe("oxygen-chlorine");
      // lib/mechanisms/oxygen-chlorine.yaml: version "1.0.0"
      expect(entries.get("mechanism-version")).toBe("1.0.0");
      expect(entries.get("condition")).toContain("altitude_km=40");
      expect(entries.get("condition")).toContain(`T_K=${Number(created.result.condition.T_K.toPrecision(6))}`);
      expect(entries.get("permalink")?.endsWith(`/a/${id}`)).toBe(true);
    }
    // behind a proxy the permalink uses the address the client used
    const proxied = await request.get(`/api/analyses/${id}/rates.csv`, {
      headers: { "x-forwarded-host": "ozone.example.org", "x-forwarded-proto": "https" },
    });
    expect(block(await proxied.text()).get("permalink")).toBe(`https://ozone.example.org/a/${id}`);
    const rates = await (await request.get(`/api/analyses/${id}/rates.csv?comments=none`)).text();
    expect(readCsv(rates)).toHaveLength(created.result.steadyState.reactions.length + 1);
    // a file name that is a property of every object is an unknown export, not a server error
    expect((await request.get(`/api/analyses/${id}/toString`)).status()).toBe(404);
    const wrong = await request.get(`/api/analyses/${id}/rates.csv?comments=off`);
    expect(wrong.status()).toBe(400);
    expect((await wrong.json()).error.message).toContain("comments=none");
  });

  test("sweep and comparison CSVs carry the profile and both sides; profile.csv still reads as a profile", async ({
    request,
  }) => {
    const small = {
      mechanismId: "oxygen-chlorine",
      profile: { kind: "standard" },
      grid: { from_km: 30, to_km: 40, step_km: 5 },
    };
    const sweep = await finish(request, (await (await request.post("/api/profiles", { data: small })).json()).id);
    expect(sweep.state).toBe("done");
    for (const file of ["levels.csv", "cycles.csv"]) {
      const { entries } = await checkExport(request, `/api/profiles/${sweep.resultId}/${file}`, [
        "mechanism-id",
        "mechanism-version",
        "profile",
        "condition",
        "request",
      ]);
      expect(entries.get("permalink")?.endsWith(`/profiles/${sweep.resultId}`)).toBe(true);
      expect(JSON.parse(entries.get("request") as string).grid).toEqual(small.grid);
    }
    expect((await request.get(`/api/profiles/${sweep.resultId}/constructor`)).status()).toBe(404);
    // profile.csv is the upload format, whose own "# title:" lines stay in the bare file
    const profile = await (await request.get(`/api/profiles/${sweep.resultId}/profile.csv`)).text();
    const profileBare = await (await request.get(`/api/profiles/${sweep.resultId}/profile.csv?comments=none`)).text();
    expect(block(profile).get("mechanism-id")).toBe("oxygen-chlorine");
    expect(profileBare.startsWith("# title: ")).toBe(true);
    expect(withoutCsvComments(profile)).toBe(withoutCsvComments(profileBare));
    expect(profile.endsWith(profileBare)).toBe(true);
    // the exported profile with its block is accepted back as an upload
    const again = await request.post("/api/profiles", {
      data: { ...small, profile: { kind: "csv", csv: profile, name: "exported.csv" } },
    });
    expect(again.status()).toBe(202);
    await finish(request, (await again.json()).id);

    const cmp = await finish(
      request,
      (
        await (
          await request.post("/api/comparisons", {
            data: { a: { sweepId: sweep.resultId }, b: { sweepId: sweep.resultId } },
          })
        ).json()
      ).id,
    );
    const { entries } = await checkExport(request, `/api/comparisons/${cmp.resultId}/comparison.csv`, [
      "a-mechanism-id",
      "b-mechanism-id",
      "a-mechanism-version",
      "a-sweep",
      "b-sweep",
    ]);
    expect(entries.get("a-sweep")?.endsWith(`/profiles/${sweep.resultId}`)).toBe(true);
  });

  test("the assessment key, template and marks carry the block, and a filled-in template with it is marked", async ({
    request,
  }) => {
    const created = await (
      await request.post("/api/assessments", {
        data: {
          title: "Route test: provenance",
          mechanismId: "oxygen-chlorine",
          variants: 2,
          seed: 11,
          base: { altitude_km: 35, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 },
          ranges: { altitude_km: { min: 30, max: 40 } },
          questions: [{ kind: "dominant-family" }],
        },
      })
    ).json();
    const base = `/api/assessments/${created.instructorId}`;
    const key = await checkExport(request, `${base}/key.csv`, ["mechanism-id", "assessment", "variants"]);
    expect(key.entries.get("permalink")?.endsWith(`/assess/i/${created.instructorId}`)).toBe(true);
    const template = await checkExport(request, `${base}/answers-template.csv`, ["mechanism-id"]);
    // the template a student fills in points to the student link, never the instructor's
    expect(template.entries.get("permalink")?.endsWith(`/assess/s/${created.studentId}`)).toBe(true);
    expect(template.text).not.toContain(created.instructorId);

    const filled = template.text.replace("\r\n,1,\r\n", "\r\nStudent 01,1,x\r\n").replace("\r\n,2,\r\n", "\r\n");
    const marked = await request.post(`${base}/marks?format=csv`, {
      data: filled,
      headers: { "content-type": "text/csv" },
    });
    expect(marked.status()).toBe(200);
    const marks = await marked.text();
    expect(block(marks).get("table")?.startsWith("marks.csv:")).toBe(true);
    const rows = readCsv(withoutCsvComments(marks));
    expect(rows[0].slice(0, 3)).toEqual(["student", "variant", "q1"]);
    expect(rows[1][0]).toBe("Student 01");
  });

  test("a run's CSVs carry the mechanism, the condition, the request and the run's status", async ({ request }) => {
    const job = await (
      await request.post("/api/runs", {
        data: { mechanismId: "oxygen-chlorine", condition: { altitude_km: 35 }, days: 1 },
      })
    ).json();
    const done = await finish(request, job.id);
    expect(done.state).toBe("done");
    for (const file of ["hours.csv", "rates.csv", "daily.csv"]) {
      const { entries } = await checkExport(request, `/api/runs/${done.resultId}/${file}`, [
        "mechanism-id",
        "mechanism-version",
        "condition",
        "request",
        "record",
        "run-status",
      ]);
      expect(entries.get("permalink")?.endsWith(`/runs/${done.resultId}`)).toBe(true);
    }
  });
});
