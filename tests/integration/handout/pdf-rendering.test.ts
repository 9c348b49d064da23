import { describe, expect, it } from "vitest";
import { fitWithin } from "@/lib/handout-pdf/fit-within";
import { pdfText } from "@/lib/handout-pdf/pdf-text";
import { renderHandoutPdf } from "@/lib/handout-pdf/render-handout-pdf";
import { sampleContent } from "../../unit/programmes/fixtures";
import { readPdf } from "./support/read-pdf";

// No database here: what the PDF can print in Helvetica, and how a photo is scaled. Kept beside the route tests
// because the same PDF reader checks the result.
describe("text the handout prints in Helvetica", () => {
  it("keeps what Windows-1252 can draw, the units and punctuation of the handout included", () => {
    const text = "300 µs · 2 × 3 cm, café, Zoë, “quoted” – dash, 35\u00a0Hz";
    expect(pdfText(text)).toBe(text);
  });

  it("gives letters outside it their base letter, or a visible question mark, and drops what has no stand-in", () => {
    expect(pdfText("Łukasz Ștefan Đorđe")).toBe("Lukasz Stefan Dorde");
    expect(pdfText("≥ 3 cm, −5, 2→3")).toBe(">= 3 cm, -5, 2->3");
    expect(pdfText("王 Li")).toBe("? Li");
    expect(pdfText("▲ Careful 👍🏽")).toBe(" Careful ");
    expect(pdfText("stimu\u00adlation")).toBe("stimulation");
  });

  it("reads back from the PDF as the stand-ins, not as wrong glyphs", async () => {
    const pdf = await renderHandoutPdf({
      clientName: "Łukasz Ștefan",
      clinicName: "Invented clinic",
      contact: {},
      versionNumber: 1,
      publishedAt: new Date("2026-01-05T10:00:00Z"),
      therapistName: "Invented therapist",
      content: sampleContent(),
      photos: new Map(),
    });
    const { text } = await readPdf(new Uint8Array(pdf));
    expect(text).toContain("Lukasz Stefan");
    expect(text).toContain("Ask your therapist for the clinic's contact details.");
  });
});

describe("cautions that fill more than a page", () => {
  it("are all printed, the box running on to the next page rather than being cut off", async () => {
    const content = sampleContent();
    // The most the programme allows: 20 of the therapist's own, each near the 300-character limit.
    content.ownCautions = Array.from(
      { length: 20 },
      (_, index) => `Invented caution ${index + 1}. ${"Keep an eye on the skin and stop if it hurts. ".repeat(6).trim()}`,
    );
    const pdf = await renderHandoutPdf({
      clientName: "Invented client",
      clinicName: "Invented clinic",
      contact: {},
      versionNumber: 1,
      publishedAt: new Date("2026-01-05T10:00:00Z"),
      therapistName: "Invented therapist",
      content,
      photos: new Map(),
    });
    const { text, pageCount, offPageText, overlappingText } = await readPdf(new Uint8Array(pdf));
    for (const caution of [...content.standardCautions, ...content.ownCautions]) expect(text).toContain(caution);
    expect(offPageText).toEqual([]);
    expect(overlappingText).toEqual([]);
    expect(text).toContain("Rampline is not a medical device");
    expect(pageCount).toBeGreaterThan(3);
  });
});

describe("fitting a placement photo in its box", () => {
  const box = { width: 200, height: 100 };

  it("keeps the aspect ratio and touches the box on the tighter side", () => {
    const landscape = fitWithin({ width: 1600, height: 1200 }, box);
    expect(landscape.height).toBe(100);
    expect(landscape.width / landscape.height).toBeCloseTo(1600 / 1200, 9);
    expect(fitWithin({ width: 1600, height: 400 }, box)).toEqual({ width: 200, height: 50 });
  });

  it("scales a small photo up to the box rather than leaving a thumbnail", () => {
    expect(fitWithin({ width: 50, height: 50 }, box)).toEqual({ width: 100, height: 100 });
  });

  it("draws nothing for a photo with no size instead of dividing by zero", () => {
    expect(fitWithin({ width: 0, height: 10 }, box)).toEqual({ width: 0, height: 0 });
  });
});
