import { StyleSheet } from "@react-pdf/renderer";

// Rampline's palette (app/globals.css) as the PDF needs it: hex values, because react-pdf has no Tailwind. The page
// stays white rather than the app's paper tone so a home printer does not lay ink over every page.
export const COLOURS = {
  ink: "#1b2633",
  inkSoft: "#445468",
  line: "#8a8070",
  note: "#1e5673",
  noteBg: "#e1eef5",
  warning: "#7a4700",
  warningBg: "#fcebc8",
  white: "#ffffff",
} as const;

// A4 in points, with margins of 20 mm at the sides: wide enough to hold the sheet without covering words.
export const PAGE = { width: 595.28, height: 841.89, margin: 56.7, top: 50, bottom: 76 } as const;
export const CONTENT_WIDTH = PAGE.width - 2 * PAGE.margin;

// Body text at 12 pt and headings from 16 pt up: many readers have impaired vision or read it tired.
export const TYPE = { body: 12, small: 11, h1: 26, h2: 20, h3: 16, kicker: 12 } as const;

export const styles = StyleSheet.create({
  page: {
    paddingTop: PAGE.top,
    paddingBottom: PAGE.bottom,
    paddingHorizontal: PAGE.margin,
    fontFamily: "Helvetica",
    fontSize: TYPE.body,
    color: COLOURS.ink,
  },
  // Line height sits on the flowing content, not the page: set on the page, react-pdf drops the page numbers.
  flow: { lineHeight: 1.4 },
  header: { borderBottomWidth: 2, borderBottomColor: COLOURS.ink, paddingBottom: 10, marginBottom: 18 },
  kicker: { fontSize: TYPE.kicker, fontFamily: "Helvetica-Bold", color: COLOURS.inkSoft },
  h1: { fontSize: TYPE.h1, fontFamily: "Helvetica-Bold", lineHeight: 1.2, marginTop: 4, marginBottom: 4 },
  section: { marginBottom: 20 },
  h2: { fontSize: TYPE.h2, fontFamily: "Helvetica-Bold", lineHeight: 1.25, marginBottom: 6 },
  h3: { fontSize: TYPE.h3, fontFamily: "Helvetica-Bold", lineHeight: 1.25, marginTop: 10, marginBottom: 4 },
  paragraph: { marginBottom: 4 },
  bold: { fontFamily: "Helvetica-Bold" },
  listItem: { flexDirection: "row", marginBottom: 4 },
  listMarker: { width: 24, fontFamily: "Helvetica-Bold" },
  listText: { flex: 1 },
  tableRow: { flexDirection: "row", borderBottomWidth: 0.75, borderBottomColor: COLOURS.line, paddingVertical: 4 },
  tableLabel: { width: "38%", paddingRight: 8, fontFamily: "Helvetica-Bold" },
  tableValue: { width: "62%" },
  footer: { borderTopWidth: 2, borderTopColor: COLOURS.ink, paddingTop: 10, marginTop: 4 },
  soft: { color: COLOURS.inkSoft },
  pageFooter: {
    position: "absolute",
    left: PAGE.margin,
    right: PAGE.margin,
    bottom: 30,
    flexDirection: "row",
    justifyContent: "space-between",
    fontSize: TYPE.small,
    color: COLOURS.inkSoft,
    borderTopWidth: 0.75,
    borderTopColor: COLOURS.line,
    paddingTop: 6,
  },
});
