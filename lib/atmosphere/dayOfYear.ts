/**
 * Day of the year (1 = 1 January) of a Gregorian calendar date "YYYY-MM-DD".
 */
import { InputError } from "../errors";

const DAYS_BEFORE_MONTH = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334];

/** True for a Gregorian leap year. */
export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Day of the year, 1–366, of a date written "YYYY-MM-DD". Throws InputError for a malformed or impossible date. */
export function dayOfYear(date: string): number {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(typeof date === "string" ? date : "");
  if (!m) throw new InputError("date", `dayOfYear: "${date}" is not a date of the form YYYY-MM-DD`);
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  const monthLengths = [31, isLeapYear(year) ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  if (month < 1 || month > 12 || day < 1 || day > monthLengths[month - 1]) {
    throw new InputError("date", `dayOfYear: "${date}" is not a calendar date`);
  }
  return DAYS_BEFORE_MONTH[month - 1] + day + (month > 2 && isLeapYear(year) ? 1 : 0);
}
