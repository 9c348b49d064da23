import { Circle, Line, Polygon, Svg, Text, View } from "@react-pdf/renderer";
import { List } from "./blocks";
import { COLOURS, PAGE, TYPE } from "./theme";

// Helvetica has no ▲ (U+25B2): as text it prints as a stray "²". The symbol is drawn instead, so it shows in any
// reader and on any printer; the word "Cautions" beside it carries the meaning on a black-and-white print.
function WarningTriangle() {
  return (
    <Svg width={24} height={22} viewBox="0 0 24 22">
      <Polygon points="12,1 23,21 1,21" fill={COLOURS.ink} stroke={COLOURS.ink} strokeWidth={1} strokeLinejoin="round" />
      <Line x1={12} x2={12} y1={8} y2={14.5} stroke={COLOURS.white} strokeWidth={2.4} strokeLinecap="round" />
      <Circle cx={12} cy={18} r={1.4} fill={COLOURS.white} />
    </Svg>
  );
}

// A cautious guess at the box's height (about 64 characters to a line of 12 pt in the box, 1.4 line height).
// react-pdf cannot measure before it lays out, and a box kept whole that is taller than a page would be cut off.
export function cautionBoxHeight(cautions: readonly string[]): number {
  const lines = cautions.reduce((sum, caution) => sum + Math.max(1, Math.ceil(caution.length / 64)), 0);
  return 70 + lines * TYPE.body * 1.4 + cautions.length * 4;
}
const PAGE_BODY_HEIGHT = PAGE.height - PAGE.top - PAGE.bottom;

// Every caution, the standard ones first, is always printed: stimulation can burn or damage skin. The box starts a
// new page rather than split when it fits on one, so no page shows cautions without their heading.
export function CautionBox({ cautions }: { cautions: readonly string[] }) {
  return (
    <View
      wrap={cautionBoxHeight(cautions) > PAGE_BODY_HEIGHT * 0.9}
      style={{
        borderWidth: 2,
        borderColor: COLOURS.ink,
        borderLeftWidth: 8,
        borderLeftColor: COLOURS.warning,
        backgroundColor: COLOURS.warningBg,
        padding: 12,
        marginBottom: 20,
      }}
    >
      <View style={{ flexDirection: "row", alignItems: "center", marginBottom: 8 }} minPresenceAhead={60}>
        <WarningTriangle />
        <Text style={{ fontSize: TYPE.h2, fontFamily: "Helvetica-Bold", marginLeft: 8 }}>Cautions</Text>
      </View>
      <List items={cautions} numbered={false} />
    </View>
  );
}
