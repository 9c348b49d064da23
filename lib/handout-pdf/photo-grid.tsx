// Named apart from the HTML <img>: a react-pdf image has no alt text to give; the caption under it names it.
import { Image as PdfImage, Text, View } from "@react-pdf/renderer";
import { fitWithin } from "./fit-within";
import { MAX_PHOTOS_PER_CHANNEL, type HandoutPhoto } from "./handout-photo";
import { COLOURS, CONTENT_WIDTH, TYPE, styles } from "./theme";

const GAP = 12;
// Two photos side by side, each in a box of the same size; a photo is scaled to fit its box, never cropped.
const BOX = { width: (CONTENT_WIDTH - GAP) / 2, height: 200 };

type Props = { channelNumber: number; photoIds: readonly string[]; photos: ReadonlyMap<string, HandoutPhoto> };

export function PhotoGrid({ channelNumber, photoIds, photos }: Props) {
  const wanted = photoIds.slice(0, MAX_PHOTOS_PER_CHANNEL);
  if (wanted.length === 0) return null;
  const missing = wanted.filter((id) => !photos.has(id)).length;
  return (
    <View>
      {/* Said before the photos, so it stays with the heading rather than drifting onto the next page. */}
      {missing > 0 ? (
        <Text style={{ ...styles.paragraph, marginTop: 6 }}>
          {`${missing === 1 ? "One placement photo" : `${missing} placement photos`} could not be printed here. ` +
            "Ask your clinic to show you where the electrodes go."}
        </Text>
      ) : null}
      <View style={{ flexDirection: "row", flexWrap: "wrap", gap: GAP, marginTop: 6 }}>
        {wanted.map((id, index) => {
          const photo = photos.get(id);
          if (!photo) return null;
          const size = fitWithin(photo, BOX);
          return (
            <View key={id} style={{ width: BOX.width }} wrap={false}>
              <PdfImage
                src={{ data: photo.data, format: photo.format }}
                style={{ width: size.width, height: size.height, borderWidth: 0.75, borderColor: COLOURS.ink }}
              />
              <Text style={{ ...styles.soft, fontSize: TYPE.small, marginTop: 2 }}>{`Channel ${channelNumber}, placement photo ${index + 1}`}</Text>
            </View>
          );
        })}
      </View>
    </View>
  );
}
