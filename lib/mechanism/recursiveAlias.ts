/**
 * A YAML alias inside the very node its anchor names (`a: &a [*a]`) makes the
 * parsed data circular. YAML allows it (anchors and aliases make its
 * representation a graph, not a tree: YAML 1.2.2, from memory), but a mechanism
 * document is a tree: every later walk over the data (the bidi check, the
 * reader, the canonical form) would never end, and each upload with one kept
 * an engine worker busy until the job time limit (30 s). The loader refuses it
 * before the data is built, naming the alias.
 *
 * One pass in document order: an alias refers to the last node before it that
 * carries its anchor name, so the pass keeps the latest node per name and asks
 * whether that node is among the alias's ancestors (at most the nesting limit,
 * 64, of them after the pre-scan of nestingDepth.ts).
 */
import { type Document, isAlias, isNode, type Node, visit } from "yaml";

/** The first alias that refers to a node containing it: its anchor name and its offset in the text; or null. */
export function findRecursiveAlias(doc: Document): { name: string; offset: number } | null {
  const anchored = new Map<string, Node>();
  let found: { name: string; offset: number } | null = null;
  visit(doc, (_key, node, path) => {
    if (isAlias(node)) {
      const target = anchored.get(node.source);
      if (target && path.includes(target)) {
        found = { name: node.source, offset: node.range?.[0] ?? 0 };
        return visit.BREAK;
      }
    } else if (isNode(node) && node.anchor) anchored.set(node.anchor, node);
    return undefined;
  });
  return found;
}
