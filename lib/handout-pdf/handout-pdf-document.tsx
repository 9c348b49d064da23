import { Document, Page, Text, View } from "@react-pdf/renderer";
import type { HandoutProps } from "@/components/handout/handout-document";
import { scheduleInWords } from "@/components/programme-view/plain-words";
import { Heading, List, Words } from "./blocks";
import { CautionBox } from "./caution-box";
import { ChannelSection } from "./channel-section";
import type { HandoutPhoto } from "./handout-photo";
import { styles } from "./theme";

export type HandoutPdfProps = HandoutProps & { photos: ReadonlyMap<string, HandoutPhoto> };

const longDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "Europe/London" });
// The review date is a calendar date with no time; read and written in UTC it is the same day wherever this runs.
const calendarDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });

export const CLINICIAN_STATEMENT =
  "This handout follows the advice of your treating clinician and your stimulator's instructions from its " +
  "manufacturer. If anything here seems to disagree with them, or something worries you, stop and ask your clinic " +
  "before your next session.";
export const NOT_A_MEDICAL_DEVICE = "Rampline is not a medical device and makes no clinical decisions.";

function contactLine({ contact }: HandoutProps): string {
  const parts = [contact.phone && `Telephone ${contact.phone}`, contact.email && `E-mail ${contact.email}`, contact.address].filter(Boolean);
  return parts.join(" \u00b7 ") || "Ask your therapist for the clinic's contact details.";
}

// The handout as a PDF: the same sections and wording as components/handout/handout-document.tsx, in its order.
export function HandoutPdfDocument(props: HandoutPdfProps) {
  const { content } = props;
  return (
    <Document
      title={`Home stimulation programme, version ${props.versionNumber}`}
      author={props.clinicName}
      creator="Rampline"
      producer="Rampline"
      language="en-GB"
    >
      <Page size="A4" style={styles.page}>
        <View style={styles.flow}>
          <View style={styles.header}>
            <Words style={styles.kicker}>{`${props.clinicName} \u00b7 home stimulation programme`}</Words>
            <Words style={styles.h1}>{props.clientName}</Words>
            <Words>{`Version ${props.versionNumber}, from ${longDate.format(props.publishedAt)}, written by ${props.therapistName}.`}</Words>
          </View>

          <View style={styles.section}>
            <Heading level={2}>When</Heading>
            <Words style={styles.paragraph}>{scheduleInWords(content.schedule)}</Words>
            <Words>{`Your therapist will review the programme with you on ${calendarDate.format(new Date(content.schedule.reviewOn))}.`}</Words>
          </View>

          {content.channels.map((channel, index) => (
            <ChannelSection key={channel.id} channel={channel} index={index} photos={props.photos} />
          ))}

          <View style={styles.section}>
            <Heading level={2}>Before each session: skin preparation</Heading>
            <List items={content.skinPreparation} numbered />
          </View>
          <View style={styles.section}>
            <Heading level={2}>After each session: electrode care</Heading>
            <List items={content.electrodeCare} numbered />
          </View>

          <CautionBox cautions={[...content.standardCautions, ...content.ownCautions]} />

          <View style={styles.footer} wrap={false}>
            <Words style={styles.paragraph}>{CLINICIAN_STATEMENT}</Words>
            <Words style={styles.bold}>{`Contact ${props.clinicName}`}</Words>
            <Words style={styles.paragraph}>{contactLine(props)}</Words>
            <Words style={styles.soft}>{NOT_A_MEDICAL_DEVICE}</Words>
          </View>
        </View>

        {/* On every page, so a loose sheet can be matched to its client and version. */}
        <View style={styles.pageFooter} fixed>
          <Words>{`${props.clientName} \u00b7 version ${props.versionNumber}`}</Words>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}
