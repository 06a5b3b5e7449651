/**
 * Maps a document path to the line and column of its node in the source text,
 * using the node ranges of the `yaml` package (v2) and its LineCounter. A path
 * that does not exist in the text (a missing field) resolves to its nearest
 * existing parent. JSON text is read with the same parser: JSON is YAML.
 */
import { isMap, isPair, isScalar, isSeq, LineCounter, type Node, parseDocument } from "yaml";
import type { DocPath } from "./diagnostics";

export type Locator = (path: DocPath, atKey: boolean) => { line: number; column: number } | undefined;

export function makeLocator(doc: { contents: unknown }, lineCounter: LineCounter): Locator {
  return (path, atKey) => {
    let node = doc.contents as Node | null;
    let best: Node | null = node;
    for (let i = 0; i < path.length && node; i++) {
      const seg = path[i];
      let next: Node | null = null;
      if (isMap(node)) {
        for (const pair of node.items) {
          if (!isPair(pair)) continue;
          const key = isScalar(pair.key) ? pair.key.value : pair.key;
          if (String(key) === String(seg)) {
            const last = i === path.length - 1;
            next = (last && atKey ? pair.key : pair.value) as Node | null;
            if (!next) next = pair.key as Node | null;
            break;
          }
        }
      } else if (isSeq(node) && typeof seg === "number") {
        next = (node.items[seg] as Node | undefined) ?? null;
      }
      if (!next) break;
      node = next;
      best = next;
    }
    const offset = best?.range?.[0];
    if (offset === undefined) return undefined;
    const { line, col } = lineCounter.linePos(offset);
    return { line, column: col };
  };
}

/** A locator for JSON (or YAML) text that parses it only when first asked. */
export function lazyLocator(text: string): Locator {
  let locate: Locator | undefined;
  return (path, atKey) => {
    if (!locate) {
      const lineCounter = new LineCounter();
      const doc = parseDocument(text, { lineCounter, prettyErrors: false, uniqueKeys: false });
      locate = makeLocator(doc, lineCounter);
    }
    return locate(path, atKey);
  };
}
