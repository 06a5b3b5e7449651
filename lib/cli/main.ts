/**
 * Entry of the command line (bin/ozone-cycles.cjs runs it): parses argv,
 * runs the command, and maps every error to one line on stderr and an exit
 * code (0 ok, 1 failure, 2 usage); the stack only with --debug.
 */
import { CommanderError } from "commander";
import { EngineError, MechanismError } from "../errors";
import { setDiffuseFieldStore } from "../photolysis/diffuseFieldStore";
import { diskFieldStore } from "./diskFieldStore";
import { CliError, type CliIo, EXIT } from "./io";
import { buildProgram, CLI_NAME } from "./program";

export async function main(argv: string[], io: CliIo): Promise<number> {
  let code: number = EXIT.ok;
  if (io.fieldStoreDir) setDiffuseFieldStore(diskFieldStore(io.fieldStoreDir));
  const program = buildProgram(io, (c) => {
    code = c;
  });
  if (argv.length === 0) {
    program.outputHelp({ error: true });
    return EXIT.usage;
  }
  try {
    await program.parseAsync(argv, { from: "user" });
    return code;
  } catch (e) {
    return reportError(io, e, argv.includes("--debug"));
  }
}

function reportError(io: CliIo, e: unknown, debug: boolean): number {
  if (e instanceof CommanderError) {
    // commander has printed its message; help and version end well
    if (e.code === "commander.helpDisplayed" || e.code === "commander.version" || e.code === "commander.help") {
      return EXIT.ok;
    }
    return EXIT.usage;
  }
  const trace = () => {
    if (debug && e instanceof Error && e.stack) io.stderr(`${e.stack}\n`);
  };
  if (e instanceof CliError) {
    for (const line of e.message.split("\n")) io.stderr(`${CLI_NAME}: ${line}\n`);
    trace();
    return e.exitCode;
  }
  if (e instanceof MechanismError) {
    for (const d of e.problems) io.stderr(`${CLI_NAME}: ${d.message}\n`);
  } else if (e instanceof EngineError) {
    io.stderr(`${CLI_NAME}: ${e.message}\n`);
  } else {
    io.stderr(
      `${CLI_NAME}: internal error: ${e instanceof Error ? e.message : String(e)}${debug ? "" : " (add --debug for the stack)"}\n`,
    );
  }
  trace();
  return EXIT.failure;
}
