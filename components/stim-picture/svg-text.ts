/** Text size in the drawings' own units; with the wide (640) and narrow (360) layouts it stays about 12 px on screen. */
export const FONT_SIZE = 13;

/** View-box widths: the wide drawing for tablets and up, the narrow one for phones. */
export const WIDE_VIEW = 640;
export const NARROW_VIEW = 360;

// A rough width of a label, so it is only drawn where it fits; the tables always carry every value.
export const textWidth = (text: string, fontSize = FONT_SIZE) => text.length * fontSize * 0.58;

/** Tailwind classes that show the wide drawing from the `sm` breakpoint and the narrow one below it. */
export const RESPONSIVE_CLASSES = { wide: "hidden sm:block", narrow: "sm:hidden" } as const;
