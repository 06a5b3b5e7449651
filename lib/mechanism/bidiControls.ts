/**
 * Bidirectional control characters (Unicode Standard Annex #9, "Unicode
 * Bidirectional Algorithm", Table 4: the embeddings, overrides and isolates,
 * and the implicit marks): stored in a label or an id they can make it read in
 * another order than it is written, or look like another species. The loader
 * refuses them in ids and warns about them in any other text; views show user
 * text isolated (`<bdi>`, lib/viz/isolateText.ts).
 */
import type { DiagnosticSink, DocPath } from "./diagnostics";

/** ALM, LRM, RLM, LRE, RLE, PDF, LRO, RLO, LRI, RLI, FSI, PDI */
export const BIDI_CONTROL = /[\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/;

const NAMES: Readonly<Record<number, string>> = {
  1564: "arabic letter mark",
  8206: "left-to-right mark",
  8207: "right-to-left mark",
  8234: "left-to-right embedding",
  8235: "right-to-left embedding",
  8236: "pop directional formatting",
  8237: "left-to-right override",
  8238: "right-to-left override",
  8294: "left-to-right isolate",
  8295: "right-to-left isolate",
  8296: "first strong isolate",
  8297: "pop directional isolate",
};

/** "U+202E (right-to-left override)" for the first bidi control character of `text`, or undefined. */
export function describeBidiControl(text: string): string | undefined {
  const m = BIDI_CONTROL.exec(text);
  if (!m) return undefined;
  const cp = m[0].codePointAt(0) ?? 0;
  return `U+${cp.toString(16).toUpperCase().padStart(4, "0")} (${NAMES[cp]})`;
}

/** Warns at every string of the parsed document that holds a bidi control character (at most `max`). */
export function warnBidiControls(data: unknown, sink: DiagnosticSink, max = 20): void {
  let found = 0;
  const walk = (v: unknown, path: DocPath): void => {
    if (found >= max) return;
    if (typeof v === "string") {
      const what = describeBidiControl(v);
      if (what) {
        found++;
        sink.warn(
          path,
          "bidi-control",
          `the text holds the bidirectional control character ${what}, which can make it read in another order than it is stored; it is shown isolated, but remove it unless it is meant`,
        );
      }
    } else if (Array.isArray(v)) {
      for (let i = 0; i < v.length; i++) walk(v[i], [...path, i]);
    } else if (v && typeof v === "object") for (const [k, x] of Object.entries(v)) walk(x, [...path, k]);
  };
  walk(data, []);
}
