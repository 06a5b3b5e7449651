import { describe, expect, it, vi } from "vitest";
import { ASSESSMENT_KIND, STUDENT_KIND } from "@/lib/service/assessments";
import { HttpError } from "@/lib/service/http";
import { gone } from "@/lib/service/lifecycle";
import { recordForPage } from "@/lib/service/pageRecord";
import { COMPARISON_KIND, PROFILE_KIND } from "@/lib/service/profiles";
import { GONE_WHAT, recordOfPage } from "@/lib/service/recordPages";
import { RUN_KIND } from "@/lib/service/runs";

vi.mock("server-only", () => ({}));

const ID = "SLR09HuxJKQwWksI";
const none = new URLSearchParams();

describe("recordOfPage: the stored thing behind a page address", () => {
  it.each([
    [`/a/${ID}`, "analysis", "analysis"],
    [`/profiles/${ID}`, PROFILE_KIND, "profile"],
    [`/compare/${ID}`, COMPARISON_KIND, "comparison"],
    [`/assess/i/${ID}`, ASSESSMENT_KIND, "assessment"],
    [`/assess/s/${ID}`, STUDENT_KIND, "student"],
    [`/runs/${ID}`, RUN_KIND, "run"],
    [`/runs/${ID}/at/12`, RUN_KIND, "run"],
  ])("%s is the %s record (the services' own kind names)", (path, kind, what) => {
    expect(recordOfPage(path, none)).toEqual({ kind, id: ID, what });
    expect(GONE_WHAT[what as keyof typeof GONE_WHAT]).toBeTruthy();
  });

  it("the explorer opened on an upload is the upload; on a built-in mechanism it is no record", () => {
    expect(recordOfPage("/explore", new URLSearchParams({ m: `u-${ID}` }))).toEqual({
      kind: "mechanism",
      id: `u-${ID}`,
      what: "mechanism",
    });
    expect(recordOfPage("/explore", new URLSearchParams({ m: "reference" }))).toBeNull();
  });

  it("other pages, ids we never hand out and undecodable ids are no record", () => {
    for (const path of ["/", "/explore", "/profiles", "/a/x%2Fy", "/a/%E0%A4%A", `/a/${ID}/more`, "/runs"]) {
      expect(recordOfPage(path, none), path).toBeNull();
    }
  });
});

describe("recordForPage: only an unknown id is missing", () => {
  it("gives the value when the read succeeds", async () => {
    expect(await recordForPage(Promise.resolve({ id: ID }))).toEqual({ id: ID });
  });

  it("gives null for a 404 and for a 410 (deleted after the proxy's check)", async () => {
    expect(await recordForPage(Promise.reject(new HttpError(404, "not-found", "no analysis")))).toBeNull();
    expect(await recordForPage(Promise.reject(gone("analysis", ID)))).toBeNull();
  });

  it("lets a failing store through, for the error page (500)", async () => {
    const failure = new Error("SQLITE_CORRUPT: database disk image is malformed");
    await expect(recordForPage(Promise.reject(failure))).rejects.toBe(failure);
    await expect(recordForPage(Promise.reject(new HttpError(507, "storage-full", "full")))).rejects.toThrow("full");
  });
});
