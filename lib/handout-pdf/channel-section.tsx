import { View } from "@react-pdf/renderer";
import { settingsRows } from "@/components/programme-view/plain-words";
import type { ProgrammeChannel } from "@/lib/programmes/content";
import { SIDE_LABELS } from "@/lib/programmes/labels";
import { zoneLabelForMarker } from "@/lib/programmes/zone-names";
import { ELECTRODE_LETTERS } from "@/lib/placement";
import { Heading, Words } from "./blocks";
import { CycleDrawing } from "./cycle-drawing";
import type { HandoutPhoto } from "./handout-photo";
import { PhotoGrid } from "./photo-grid";
import { styles } from "./theme";

type Props = { channel: ProgrammeChannel; index: number; photos: ReadonlyMap<string, HandoutPhoto> };

function Row({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.tableRow}>
      <Words style={styles.tableLabel}>{label}</Words>
      <Words style={styles.tableValue}>{value}</Words>
    </View>
  );
}

// One channel as the HTML handout shows it: where the electrodes go (in words, since paper has no body outline
// to point at), the photos, the settings in plain words and the on/off cycle. Each part is kept whole on one page
// (all are well under a page), so a channel's title never sits alone at the foot of a page and a settings table is
// never split from its heading.
export function ChannelSection({ channel, index, photos }: Props) {
  const number = index + 1;
  return (
    <View style={styles.section}>
      <View wrap={false}>
        <Heading level={2}>{`Channel ${number}: ${channel.target} (${SIDE_LABELS[channel.side].toLowerCase()} side)`}</Heading>
        <Heading level={3}>Where the electrodes go</Heading>
        {channel.markers.map((marker, markerIndex) => (
          <Row key={markerIndex} label={`Electrode ${ELECTRODE_LETTERS[markerIndex]}`} value={zoneLabelForMarker(marker)} />
        ))}
        {channel.placementNote ? <Words style={{ ...styles.paragraph, marginTop: 6 }}>{channel.placementNote}</Words> : null}
      </View>
      <PhotoGrid channelNumber={number} photoIds={channel.photoIds} photos={photos} />

      <View wrap={false}>
        <Heading level={3}>Stimulator settings</Heading>
        {settingsRows(channel).map(([label, value]) => (
          <Row key={label} label={label} value={value} />
        ))}
      </View>

      <View wrap={false}>
        <Heading level={3}>{`Channel ${number}: one cycle of on and rest`}</Heading>
        <CycleDrawing times={channel.settings} />
      </View>
    </View>
  );
}
