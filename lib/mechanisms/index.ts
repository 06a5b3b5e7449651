/**
 * The built-in mechanism documents in this folder (<id>.yaml). The list is
 * kept here so that it can be read without touching the file system; the
 * titles and descriptions repeat the documents' own (a test checks this).
 */
export const BUILTIN_MECHANISMS = [
  {
    id: "oxygen",
    title: "Pure oxygen (Chapman) chemistry",
    description: "The Chapman reactions with O(1D) production and quenching: O2 and N2 held, O, O(1D) and O3 solved.",
  },
  {
    id: "oxygen-chlorine",
    title: "Oxygen and chlorine teaching set",
    description:
      "Chapman chemistry plus the Cl/ClO catalytic cycle, the reservoirs HCl and ClONO2 in their simplest form, and chlorine release from CFCl3 and CF2Cl2 photolysis.",
  },
  {
    id: "reference",
    title: "Reference stratosphere",
    description:
      "Ox, HOx, NOx, ClOx and BrOx chemistry with their reservoirs, a reduced methane oxidation, the photolysis of every photolabile species, the ClO dimer and ClO–BrO chemistry, and chlorine activation on sulfate aerosol, NAT and ice.",
  },
] as const satisfies readonly { id: string; title: string; description: string }[];
