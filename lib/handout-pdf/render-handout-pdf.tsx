import { Font, renderToBuffer } from "@react-pdf/renderer";
import { HandoutPdfDocument, type HandoutPdfProps } from "./handout-pdf-document";

// Words are never broken with a hyphen: a split "stimu-lation" is harder to read for someone with low vision, and
// a caution must read the same on paper as on screen. Long words move whole to the next line instead.
Font.registerHyphenationCallback((word) => [word]);

export async function renderHandoutPdf(props: HandoutPdfProps): Promise<Buffer> {
  return renderToBuffer(<HandoutPdfDocument {...props} />);
}
