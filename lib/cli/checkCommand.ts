/**
 * `check <file>`: loads a mechanism document and prints every problem with
 * its line and column, as `file:line:column: severity: message [code]`
 * (the form editors and CI logs link to). Exit 1 when there are errors.
 */
import { MechanismError } from "../errors";
import { loadMechanism } from "../mechanism";
import { diagnosticLine } from "./diagnosticLine";
import { type CliIo, EXIT, readTextFile } from "./io";
import { formatOf } from "./mechanismArgument";

export function checkCommand(io: CliIo, file: string): number {
  const text = readTextFile(io, file, "mechanism document");
  try {
    const { mechanism, warnings } = loadMechanism(text, { format: formatOf(file) });
    for (const w of warnings) io.stdout(`${diagnosticLine(file, w)}\n`);
    io.stdout(
      `${file}: no errors (${mechanism.species.length} species, ${mechanism.reactions.length} reactions, ${warnings.length} warning${warnings.length === 1 ? "" : "s"})\n`,
    );
    return EXIT.ok;
  } catch (e) {
    if (!(e instanceof MechanismError)) throw e;
    for (const d of e.problems) io.stdout(`${diagnosticLine(file, d)}\n`);
    const n = e.problems.filter((d) => d.severity === "error").length;
    io.stdout(`${file}: ${n} error${n === 1 ? "" : "s"}\n`);
    return EXIT.failure;
  }
}
