import { ownValue } from "../idRecord";

/** Printed names of the family frames. */
const LABELS: Record<string, string> = {
  Ox: "Ox · odd oxygen",
  HOx: "HOx · hydrogen radicals",
  NOx: "NOx · nitrogen oxides",
  ClOx: "ClOx · active chlorine",
  BrOx: "BrOx · active bromine",
  reservoir: "Reservoirs",
  source: "Source gases",
  held: "Held species",
  bath: "Bath gases",
  organic: "Organic radicals",
  product: "End products",
  other: "Other species",
};

export const familyLabel = (family: string): string => ownValue(LABELS, family) ?? family;
