import { Text, View } from "@react-pdf/renderer";
import type { ComponentProps } from "react";
import { pdfText } from "./pdf-text";
import { styles } from "./theme";

// Small building blocks of the handout. Every string goes through pdfText, so nothing reaches Helvetica that it
// would draw as the wrong letter.

type TextStyle = ComponentProps<typeof View>["style"];

export function Words({ children, style }: { children: string; style?: TextStyle }) {
  return <Text style={style}>{pdfText(children)}</Text>;
}

// A heading is kept with the first lines that follow it, never left alone at the foot of a page.
export function Heading({ level, children }: { level: 2 | 3; children: string }) {
  return (
    <Text style={level === 2 ? styles.h2 : styles.h3} minPresenceAhead={level === 2 ? 72 : 56}>
      {pdfText(children)}
    </Text>
  );
}

// Numbered for steps done in order, bulleted otherwise. An item never splits across two pages.
export function List({ items, numbered }: { items: readonly string[]; numbered: boolean }) {
  return (
    <View>
      {items.map((item, index) => (
        <View key={`${index}-${item}`} style={styles.listItem} wrap={false}>
          <Text style={styles.listMarker}>{numbered ? `${index + 1}.` : "\u2022"}</Text>
          <Words style={styles.listText}>{item}</Words>
        </View>
      ))}
    </View>
  );
}
