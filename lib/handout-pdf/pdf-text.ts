// The PDF is set in Helvetica, which every PDF reader has built in, so nothing has to be embedded or shipped. Its
// built-in encoding (Windows-1252, "WinAnsi") covers Western European text only; any other character comes out as a
// wrong glyph (Ł drawn as "A", ≥ as "e"), which on a clinical handout is worse than a plain stand-in. Every string
// the handout prints goes through pdfText first.

// The characters of Windows-1252 outside Latin-1, by their Unicode code points.
const WIN_ANSI_EXTRAS = new Set([
  0x152, 0x153, 0x160, 0x161, 0x178, 0x17d, 0x17e, 0x192, 0x2c6, 0x2dc, 0x2013, 0x2014, 0x2018, 0x2019, 0x201a, 0x201c, 0x201d, 0x201e, 0x2020,
  0x2021, 0x2022, 0x2026, 0x2030, 0x2039, 0x203a, 0x20ac, 0x2122,
]);

export function canDrawInHelvetica(codePoint: number): boolean {
  if (codePoint === 0x0a) return true;
  if (codePoint >= 0x20 && codePoint <= 0x7e) return true;
  // The soft hyphen is in the range but would print as a visible hyphen mid-word.
  if (codePoint >= 0xa0 && codePoint <= 0xff) return codePoint !== 0xad;
  return WIN_ANSI_EXTRAS.has(codePoint);
}

// Stand-ins that keep the meaning, for characters people and our own labels are likely to type.
const STAND_INS: Record<string, string> = {
  "\u2212": "-", // minus sign
  "\u2010": "-",
  "\u2011": "-",
  "\u2264": "<=",
  "\u2265": ">=",
  "\u2248": "~",
  "\u2192": "->",
  "\u2190": "<-",
  "\u03bc": "\u00b5", // Greek mu typed for micro
  "\u2032": "'",
  "\u2033": '"',
  "\u2009": " ",
  "\u2007": " ",
  "\u202f": "\u00a0",
  "\t": " ",
  "\u0141": "L",
  "\u0142": "l",
  "\u0110": "D",
  "\u0111": "d",
  "\u0126": "H",
  "\u0127": "h",
  "\u0131": "i",
};

// A letter Helvetica cannot draw keeps its base letter where it has one (ă → a, ș → s) and becomes "?" otherwise,
// so a name stays recognisable and a gap is visible; symbols and emoji without a stand-in are left out.
export function pdfText(value: string): string {
  let out = "";
  for (const char of value.normalize("NFC")) {
    const codePoint = char.codePointAt(0)!;
    if (canDrawInHelvetica(codePoint)) {
      out += char;
      continue;
    }
    const standIn = STAND_INS[char];
    if (standIn !== undefined) {
      out += standIn;
      continue;
    }
    const base = char.normalize("NFD").replace(/\p{M}/gu, "");
    if (base && [...base].every((c) => canDrawInHelvetica(c.codePointAt(0)!))) out += base;
    else if (/\p{L}/u.test(char)) out += "?";
  }
  return out;
}
