/**
 * The comment lines of the CSV uploads (profiles, trajectories): a blank line
 * or one starting with `#` is not data; a `# key: value` line before the
 * header row is kept as metadata (key lower-cased).
 */
const META = /^\s*#\s*([A-Za-z][\w-]*)\s*:\s*(.*)$/;

/** True when `line` is blank or a comment (and records it in `meta` when it is a `# key: value` line before the header). */
export function skipCommentLine(line: string, meta: Record<string, string>, beforeHeader: boolean): boolean {
  if (line.trim() === "") return true;
  if (!line.trimStart().startsWith("#")) return false;
  const m = META.exec(line);
  if (m && beforeHeader) meta[m[1].toLowerCase()] = m[2].trim();
  return true;
}
