/**
 * Direction isolation of user text drawn where markup cannot isolate it (the
 * canvas and SVG labels of the network): text holding right-to-left letters or
 * bidirectional controls is wrapped in FIRST STRONG ISOLATE … POP DIRECTIONAL
 * ISOLATE (Unicode Standard Annex #9, §2.4 and §2.6), so that it cannot
 * reorder the text around it and an override inside it ends with it. Other
 * text is returned as it is. Pages use `<bdi>` for the same purpose.
 */

const FSI = "\u2068";
const PDI = "\u2069";

/** right-to-left scripts (Hebrew to NKo and the presentation forms) and the bidi controls */
const NEEDS_ISOLATION = /[\u0590-\u08FF\uFB1D-\uFDFF\uFE70-\uFEFF\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/;

export function isolateText(text: string): string {
  return NEEDS_ISOLATION.test(text) ? `${FSI}${text}${PDI}` : text;
}
