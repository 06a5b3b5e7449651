/** Width of a species chip for its label at 15 px system sans, px (about 9 px a character, common practice for a rough text measure). */
export const chipWidth = (label: string): number => Math.max(44, Math.round([...label].length * 9 + 20));

/** Height of a species chip, px. */
export const CHIP_HEIGHT_PX = 30;

/** Width a family frame needs for its title at 16 px semibold, px (about 9.5 px a character). */
export const frameTitleWidth = (title: string): number => Math.round([...title].length * 9.5 + 16);
