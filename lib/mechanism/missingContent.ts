/**
 * What a mechanism lacks to be analysed: with no solved species there is no
 * steady state to find, and with no reactions nothing changes. Such a
 * document loads (the format allows it) but is refused where it would be
 * stored for analysis, so that every mode of analysis treats it alike.
 */
import type { Diagnostic } from "../errors";
import type { CompiledMechanism } from "./types";

export function missingContent(mech: CompiledMechanism): Diagnostic[] {
  const problems: Diagnostic[] = [];
  if (!mech.species.some((s) => s.role === "solved")) {
    problems.push({
      severity: "error",
      code: "empty-mechanism",
      path: "species",
      message: `no solved species: the document needs at least one species with role "solved" for a steady state`,
    });
  }
  if (mech.reactions.length === 0) {
    problems.push({
      severity: "error",
      code: "empty-mechanism",
      path: "reactions",
      message: "no reactions: the document needs at least one reaction",
    });
  }
  return problems;
}
