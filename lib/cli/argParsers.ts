/** Parsers of flag values: a usage error (exit 2) names the value that is not a number. */
import { InvalidArgumentError } from "commander";

export const number = (v: string): number => {
  const x = Number(v);
  if (v.trim() === "" || !Number.isFinite(x)) throw new InvalidArgumentError(`expected a number, got "${v}"`);
  return x;
};

export const integer = (v: string): number => {
  const x = number(v);
  if (!Number.isInteger(x)) throw new InvalidArgumentError(`expected a whole number, got "${v}"`);
  return x;
};
