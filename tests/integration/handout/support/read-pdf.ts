// Reads a PDF the way a person's PDF reader would, with pdf.js: how many pages, the words in reading order, and
// the images painted on each page.
import path from "node:path";
import { getDocument, OPS } from "pdfjs-dist/legacy/build/pdf.mjs";

// pdf.js needs the metrics of the 14 standard fonts (Helvetica among them) to lay text out; they ship with it.
const standardFontDataUrl = `${path.resolve("node_modules/pdfjs-dist/standard_fonts")}/`;

type TextItem = { str: string; hasEOL: boolean };

// One string per page: items joined as drawn, a line end becomes a space, except after a hyphen where a word such
// as "finger-widths" was wrapped. NFKC folds the micro sign (U+00B5) and the Greek mu (U+03BC) that pdf.js reads
// back for Helvetica's "mu" glyph into one character, so "300 µs" compares equal either way.
export function joinText(items: readonly TextItem[]): string {
  const raw = items.map((item) => item.str + (item.hasEOL ? "\n" : "")).join("");
  return raw.replace(/-\n/g, "-").replace(/\s+/g, " ").normalize("NFKC").trim();
}

export const comparable = (text: string) => text.replace(/\s+/g, " ").normalize("NFKC");

export type ReadPdf = {
  pageCount: number;
  pages: string[];
  text: string;
  images: { page: number; width: number; height: number }[];
  // Text drawn outside the page, or over other text, still reads back; these list what a reader could not read.
  offPageText: string[];
  overlappingText: [string, string][];
};

type Placed = { str: string; x: number; y: number; width: number; height: number };

// Two runs of text collide when they share horizontal space and their baselines are closer than most of a line,
// which is what an over-full block that react-pdf squeezes onto one page looks like.
function collisions(items: readonly Placed[]): [string, string][] {
  const found: [string, string][] = [];
  items.forEach((a, i) => {
    for (const b of items.slice(i + 1)) {
      const sharesColumn = Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x) > 1;
      if (sharesColumn && Math.abs(a.y - b.y) < 0.8 * Math.min(a.height, b.height)) found.push([a.str, b.str]);
    }
  });
  return found;
}

export async function readPdf(bytes: Uint8Array): Promise<ReadPdf> {
  const doc = await getDocument({ data: new Uint8Array(bytes), standardFontDataUrl, verbosity: 0, isEvalSupported: false }).promise;
  try {
    const pages: string[] = [];
    const images: ReadPdf["images"] = [];
    const offPageText: string[] = [];
    const overlappingText: [string, string][] = [];
    for (let number = 1; number <= doc.numPages; number += 1) {
      const page = await doc.getPage(number);
      // Marked-content entries carry no text; only the text items are kept.
      const items = (await page.getTextContent()).items.flatMap((item) => ("str" in item ? [item] : []));
      pages.push(joinText(items));
      const [, , width, height] = page.view as [number, number, number, number];
      const placed = items
        .filter((item) => item.str.trim())
        .map((item) => ({ str: item.str, x: item.transform[4] as number, y: item.transform[5] as number, width: item.width, height: item.height }));
      offPageText.push(...placed.filter(({ x, y }) => x < 0 || x > width || y < 0 || y > height).map((item) => item.str));
      overlappingText.push(...collisions(placed));
      const operators = await page.getOperatorList();
      for (const [index, op] of operators.fnArray.entries()) {
        if (op !== OPS.paintImageXObject) continue;
        const name = (operators.argsArray[index] as [string])[0];
        // Decoded images sit in the page's objects, or the document's when pdf.js shares a large one.
        const objects = name.startsWith("g_") ? page.commonObjs : page.objs;
        const image = objects.get(name) as { width: number; height: number };
        images.push({ page: number, width: image.width, height: image.height });
      }
    }
    return { pageCount: doc.numPages, pages, text: pages.join(" "), images, offPageText, overlappingText };
  } finally {
    await doc.destroy();
  }
}
