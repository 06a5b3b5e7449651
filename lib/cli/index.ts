export { CliError, type CliIo, EXIT } from "./io";
export { main } from "./main";
export { buildProgram, CLI_NAME } from "./program";
