/**
 * The one-line caution that travels with what leaves the service (CSV exports,
 * printed sheets and keys); the full text is in README.md, "Cautions".
 */
export const CAUTION_LINE =
  "Research and teaching tool: not for regulatory reporting, health or UV-exposure advice, or operational forecasts.";
