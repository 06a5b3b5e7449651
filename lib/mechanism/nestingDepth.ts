/**
 * A linear pre-scan of a document's nesting, run before any parser sees the
 * text: a body of two million brackets must be refused in milliseconds, not
 * after the parsers have built (or overflowed the stack on) two million
 * levels. JSON: brackets outside strings. YAML: the indentation stack, each
 * compact "- " entry that opens a sequence on the same line, and flow
 * brackets outside quoted scalars; block scalars (| and >) are skipped. The
 * YAML count is an upper bound of the parser's depth within a few levels,
 * which is all a limit of 64 needs (real mechanisms nest 4 to 6 levels).
 */

export const NESTING_DEFAULTS = {
  /** deepest nesting accepted, levels; default 64 */
  maxDepth: 64,
};

export interface TooDeep {
  /** the depth first exceeded (maxDepth + 1) */
  depth: number;
  /** 1-based line of the bracket or entry that went too deep */
  line: number;
  /** 1-based column */
  column: number;
}

const OPEN_SQUARE = 91;
const CLOSE_SQUARE = 93;
const OPEN_CURLY = 123;
const CLOSE_CURLY = 125;
const QUOTE = 34;
const APOSTROPHE = 39;
const BACKSLASH = 92;
const NEWLINE = 10;
const SPACE = 32;
const TAB = 9;
const HASH = 35;
const DASH = 45;

/** The first place where JSON text nests deeper than maxDepth, or null. */
export function jsonTooDeep(text: string, maxDepth = NESTING_DEFAULTS.maxDepth): TooDeep | null {
  let depth = 0;
  let line = 1;
  let lineStart = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === NEWLINE) {
      line++;
      lineStart = i + 1;
    } else if (inString) {
      if (c === BACKSLASH) i++;
      else if (c === QUOTE) inString = false;
    } else if (c === QUOTE) inString = true;
    else if (c === OPEN_SQUARE || c === OPEN_CURLY) {
      if (++depth > maxDepth) return { depth, line, column: i - lineStart + 1 };
    } else if (c === CLOSE_SQUARE || c === CLOSE_CURLY) depth = Math.max(0, depth - 1);
  }
  return null;
}

/** Characters after which a quote opens a quoted YAML scalar (else it is part of a plain one). */
const OPENS_SCALAR = new Set([SPACE, TAB, OPEN_SQUARE, OPEN_CURLY, 44 /* , */, 58 /* : */]);

/** A line whose content ends in "|" or ">" (with chomping or indentation indicators) starts a block scalar. */
const BLOCK_SCALAR_HEADER = /(^|\s)[|>][-+0-9]*\s*$/;

/** The first place where YAML text nests deeper than maxDepth, or null. */
export function yamlTooDeep(text: string, maxDepth = NESTING_DEFAULTS.maxDepth): TooDeep | null {
  const indents: number[] = [];
  let flow = 0;
  let quote = 0;
  let blockScalarIndent = -1;
  let line = 0;
  let pos = 0;
  while (pos <= text.length) {
    let end = text.indexOf("\n", pos);
    if (end < 0) end = text.length;
    line++;
    let i = pos;
    while (i < end && (text.charCodeAt(i) === SPACE || text.charCodeAt(i) === TAB)) i++;
    const indent = i - pos;
    const blank = i === end || text.charCodeAt(i) === HASH;
    if (blockScalarIndent >= 0 && (blank || indent > blockScalarIndent)) {
      pos = end + 1;
      continue;
    }
    blockScalarIndent = -1;
    if (blank && quote === 0) {
      pos = end + 1;
      continue;
    }
    let lineDepth = 0;
    if (quote === 0 && flow === 0) {
      while (indents.length && indents[indents.length - 1] > indent) indents.pop();
      if (!indents.length || indents[indents.length - 1] < indent) indents.push(indent);
      // "- - - x": each compact entry opens one more sequence on this line
      while (i + 1 < end && text.charCodeAt(i) === DASH && text.charCodeAt(i + 1) === SPACE) {
        lineDepth++;
        i += 2;
        while (i < end && text.charCodeAt(i) === SPACE) i++;
      }
      if (indents.length + lineDepth > maxDepth) return { depth: maxDepth + 1, line, column: i - pos + 1 };
    }
    let prev = i > pos ? text.charCodeAt(i - 1) : SPACE;
    let contentEnd = end;
    for (; i < end; i++) {
      const c = text.charCodeAt(i);
      if (quote === QUOTE) {
        if (c === BACKSLASH) i++;
        else if (c === QUOTE) quote = 0;
      } else if (quote === APOSTROPHE) {
        if (c === APOSTROPHE) {
          if (text.charCodeAt(i + 1) === APOSTROPHE) i++;
          else quote = 0;
        }
      } else if ((c === QUOTE || c === APOSTROPHE) && OPENS_SCALAR.has(prev)) quote = c;
      else if (c === HASH && (prev === SPACE || prev === TAB)) {
        contentEnd = i;
        break;
      } else if (c === OPEN_SQUARE || c === OPEN_CURLY) {
        flow++;
        if (indents.length + lineDepth + flow > maxDepth) return { depth: maxDepth + 1, line, column: i - pos + 1 };
      } else if ((c === CLOSE_SQUARE || c === CLOSE_CURLY) && flow > 0) flow--;
      prev = c;
    }
    if (quote === 0 && flow === 0 && BLOCK_SCALAR_HEADER.test(text.slice(Math.max(pos, contentEnd - 16), contentEnd))) {
      blockScalarIndent = indent;
    }
    pos = end + 1;
  }
  return null;
}

/**
 * The JSON scan of `jsonTooDeep` fed chunk by chunk as a body arrives, on its
 * UTF-8 bytes (brackets, quotes and backslashes are single bytes, never part
 * of a longer character), so that a hostile body is refused after its first
 * chunk instead of after all 4 MB. Columns count bytes.
 */
export class JsonDepthScanner {
  private depth = 0;
  private inString = false;
  private escaped = false;
  private line = 1;
  private column = 0;

  constructor(private readonly maxDepth = NESTING_DEFAULTS.maxDepth) {}

  /** Scans the next chunk; the first place too deep, or null. */
  feed(chunk: Uint8Array): TooDeep | null {
    for (let i = 0; i < chunk.length; i++) {
      const c = chunk[i];
      this.column++;
      if (c === NEWLINE) {
        this.line++;
        this.column = 0;
      } else if (this.inString) {
        if (this.escaped) this.escaped = false;
        else if (c === BACKSLASH) this.escaped = true;
        else if (c === QUOTE) this.inString = false;
      } else if (c === QUOTE) this.inString = true;
      else if (c === OPEN_SQUARE || c === OPEN_CURLY) {
        if (++this.depth > this.maxDepth) return { depth: this.depth, line: this.line, column: this.column };
      } else if (c === CLOSE_SQUARE || c === CLOSE_CURLY) this.depth = Math.max(0, this.depth - 1);
    }
    return null;
  }
}
