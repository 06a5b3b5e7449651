import { describe, expect, it } from "vitest";
import { jsonParseMessage, printable, safeExcerpt } from "../lib/errors";

const parseError = (t: string) => {
  try {
    JSON.parse(t);
  } catch (e) {
    return e;
  }
  throw new Error("expected a syntax error");
};

describe("excerpts of user input in error messages", () => {
  it("quote at most 40 characters, cut with an ellipsis", () => {
    expect(safeExcerpt("x".repeat(200))).toBe(`"${"x".repeat(40)}…"`);
    expect(safeExcerpt("short")).toBe('"short"');
  });

  it("escape control characters, quotes and backslashes", () => {
    expect(safeExcerpt('\u0000a\n"\\\u001b')).toBe('"\\u0000a\\n\\"\\\\\\u001b"');
    expect(printable("tab\there\u007f")).toBe("tab\\there\\u007f");
  });

  it("drop the input V8 echoes into a JSON syntax error", () => {
    const binary = `\u0000\u0001\u0002binary${"\u00ff".repeat(150)}`;
    const m = jsonParseMessage(parseError(binary));
    expect(m).toBe('unexpected character "\\u0000"');
    expect(jsonParseMessage(parseError("{a}"))).toMatch(/position 1/);
  });
});
