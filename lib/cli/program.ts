/**
 * The command line's commands and flags (commander 14). Each action returns
 * an exit code; main() maps errors to one line on stderr. The commands are
 * imported when they run, so that --help and usage errors do not load the
 * engine (its photolysis tables alone take ~150 ms of CPU to set up).
 */
import { Command, Option } from "commander";
import { BUILTIN_MECHANISMS } from "../mechanisms";
import type { AnalyseFlags } from "./analyseCommand";
import { SUMMARY_DEFAULTS } from "./analysisSummary";
import { integer, number } from "./argParsers";
import type { CompareFlags } from "./compareCommand";
import { addConditionFlags, addUncertaintyFlags } from "./conditionFlags";
import type { CliIo } from "./io";
import type { SweepFlags } from "./sweepCommand";

export const CLI_NAME = "ozone-cycles";

/** the built-in mechanism used when none is named */
const DEFAULT_MECHANISM = "reference";

const mechanismHelp = `built-in id (${BUILTIN_MECHANISMS.map((m) => m.id).join(", ")}) or a YAML/JSON document file`;

/** The program; `done(code)` receives each action's exit code. */
export function buildProgram(io: CliIo, done: (code: number) => void): Command {
  const program = new Command(CLI_NAME)
    .description("Photochemical steady states, odd-oxygen budgets and catalytic cycles, from the command line.")
    .option("--debug", "print the stack of an error")
    .configureOutput({ writeOut: io.stdout, writeErr: io.stderr })
    .exitOverride();
  program.addHelpText(
    "after",
    `\nExamples:\n  ${CLI_NAME} check my-mechanism.yaml\n  ${CLI_NAME} analyse --altitude 30 --latitude 45\n  ${CLI_NAME} sweep --profile standard --csv levels > levels.csv`,
  );

  program
    .command("check")
    .description("check a mechanism document: every problem with its line and column; exit 1 on errors")
    .argument("<file>", "mechanism document, YAML or JSON")
    .action(async (file: string) => done((await import("./checkCommand")).checkCommand(io, file)));

  const analyse = program
    .command("analyse")
    .alias("analyze")
    .description("analyse a mechanism at one condition: Ox budget by family and the top cycles")
    .option("-m, --mechanism <id|file>", mechanismHelp, DEFAULT_MECHANISM)
    .option("-c, --condition-file <file>", "condition as a JSON or YAML object of condition fields; flags override it");
  addConditionFlags(analyse);
  addUncertaintyFlags(analyse)
    .option("--json", "the whole result as JSON")
    .option("--csv <table>", "one table: rates, species, cycles, uncertainty or sensitivities")
    .option("--no-comments", "CSV without its # provenance lines")
    .option("--top <n>", "cycles in the summary", integer, SUMMARY_DEFAULTS.topCycles)
    .option("-o, --output <file>", "write to a file instead of stdout")
    .option(
      "--server <url>",
      "send the analysis to a running service (e.g. http://localhost:3000) and print its permalink",
    )
    .action(async (flags: AnalyseFlags) => done(await (await import("./analyseCommand")).analyseCommand(io, flags)));

  const sweep = program
    .command("sweep")
    .description("analyse every level of a profile; CSV (levels, cycles or profile) or JSON for compare")
    .option("-m, --mechanism <id|file>", mechanismHelp, DEFAULT_MECHANISM)
    .option("-p, --profile <name|file>", '"standard", an invented demo profile id, or a profile CSV file', "standard")
    .option("-c, --condition-file <file>", "request-wide condition fields (JSON or YAML); flags override it")
    .option("--from <km>", "lowest level, km; default the profile's, at least 10", number)
    .option("--to <km>", "highest level, km; default the profile's, at most 60", number)
    .option("--step <km>", "level spacing, km; default 1", number)
    .addOption(
      new Option("--parallel <how>", "warm-started chains side by side; default auto").choices([
        "auto",
        "parallel",
        "sequential",
      ]),
    )
    .option("--column-passes <n>", "most passes of the overhead O3 column when O3 is solved; default 3", integer)
    .option("--column-tolerance <fraction>", "column change that ends the passes; default 0.01", number);
  addConditionFlags(sweep, true)
    .option("--json", "the whole sweep as JSON (the input of compare)")
    .option("--csv <table>", "levels, cycles or profile", "levels")
    .option("--no-comments", "CSV without its # provenance lines")
    .option("-o, --output <file>", "write to a file instead of stdout")
    .option("--server <url>", "run the sweep as a job of a running service and print its permalink")
    .action(async (flags: SweepFlags) => done(await (await import("./sweepCommand")).sweepCommand(io, flags)));

  program
    .command("compare")
    .description("compare two sweeps written by sweep --json: Ox loss, B − A and the cycles behind it")
    .argument("<a>", "sweep A (JSON from sweep --json)")
    .argument("<b>", "sweep B (JSON from sweep --json)")
    .option("--label-a <text>", 'label of A; default "A"')
    .option("--label-b <text>", 'label of B; default "B"')
    .option("--top <n>", "cycles listed per level as explaining the difference; default 5", integer)
    .option("--json", "the whole comparison as JSON")
    .option("--no-comments", "CSV without its # provenance lines")
    .option("-o, --output <file>", "write to a file instead of stdout")
    .action(async (a: string, b: string, flags: CompareFlags) =>
      done((await import("./compareCommand")).compareCommand(io, a, b, flags)),
    );

  return program;
}
