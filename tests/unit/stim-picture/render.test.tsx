import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CycleRibbon, PulseShape, StimPicture } from "@/components/stim-picture";
import { analyseChannel } from "@/lib/stim";
import { demoChannel } from "../stim/helpers";

const text = (html: string) => html.replace(/<[^>]+>/g, " ").replaceAll("\u00a0", " ").replace(/\s+/g, " ");
const descOf = (html: string) => /<desc[^>]*>([^<]*)<\/desc>/.exec(html)?.[1]?.replaceAll("\u00a0", " ") ?? "";

describe("CycleRibbon", () => {
  const times = { rampUpS: 1, holdS: 5, rampDownS: 1, restS: 20 };

  it("is an image with a title and a description, and a table of the same figures", () => {
    const html = renderToStaticMarkup(<CycleRibbon {...times} />);
    expect(html).toMatch(/<svg[^>]*role="img"[^>]*aria-labelledby="[^"]+-title"[^>]*aria-describedby="[^"]+-desc"/);
    expect(html).toContain("<title");
    expect(descOf(html)).toContain("2 cycles of 27 s each, 54 s in all");
    expect(text(html)).toMatch(/Ramp-up Hold Ramp-down Rest Whole cycle 1 5 1 20 27/);
  });

  it("fills up to the progress time and says how far it has got", () => {
    const unfilled = renderToStaticMarkup(<CycleRibbon {...times} layout="wide" />);
    const filled = renderToStaticMarkup(<CycleRibbon {...times} layout="wide" progressSeconds={3} />);
    expect(unfilled.match(/<polygon/g)).toHaveLength(1);
    expect(filled.match(/<polygon/g)).toHaveLength(2);
    expect(descOf(filled)).toContain("Filled to 3 s of 54 s: hold of cycle 1.");
    expect(descOf(unfilled)).not.toContain("Filled");
  });

  it("draws a narrow layout for phones and a wide one from the sm breakpoint, with one table between them", () => {
    const html = renderToStaticMarkup(<CycleRibbon {...times} />);
    expect(html).toMatch(/<svg viewBox="0 0 640 190" class="[^"]*hidden sm:block/);
    expect(html).toMatch(/<svg viewBox="0 0 360 190" class="[^"]*sm:hidden/);
    expect(html.match(/<table/g)).toHaveLength(1);
    // Each drawing has its own ids, so the two never point at each other's title.
    const ids = [...html.matchAll(/aria-labelledby="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(2);
    expect(renderToStaticMarkup(<CycleRibbon {...times} layout="narrow" />).match(/<svg/g)).toHaveLength(1);
  });

  it("hides the table visually, not from screen readers, when asked", () => {
    expect(renderToStaticMarkup(<CycleRibbon {...times} table="sr-only" />)).toMatch(/<table class="sr-only"/);
  });
});

describe("PulseShape", () => {
  it("labels durations and amplitudes, and says when the axis is broken", () => {
    const html = renderToStaticMarkup(
      <PulseShape phases={[{ currentMa: 40, durationUs: 300 }, { currentMa: -10, durationUs: 1200 }]} interphaseGapUs={0} periodUs={1e6 / 35} />,
    );
    const drawing = text(html.slice(html.indexOf("</desc>"), html.indexOf("</svg>")));
    // Phase 1 is too narrow for its long label here, so it shows the bare duration.
    expect(drawing).toContain(" 300 µs ");
    expect(drawing).toContain("phase 2: 1,200 µs");
    const words = text(html);
    expect(words).toContain("\u221210 mA");
    expect(words).toContain("period 28,571 µs (35 Hz)");
    expect(descOf(html)).toContain("Not to scale");
    expect(html).toMatch(/<p[^>]*>Not to scale/);
  });

  it("says the pulses overlap when the pulse is longer than the period", () => {
    const html = renderToStaticMarkup(
      <PulseShape phases={[{ currentMa: 40, durationUs: 300 }, { currentMa: -40, durationUs: 300 }]} interphaseGapUs={0} periodUs={500} />,
    );
    expect(descOf(html)).toContain("longer than the period");
    expect(text(html)).toContain("next pulse starts here");
    expect(descOf(html)).not.toContain("Not to scale");
  });
});

describe("StimPicture", () => {
  it("lists blocks first, each finding with its icon, word, title and source", () => {
    const html = renderToStaticMarkup(<StimPicture analysis={analyseChannel(demoChannel({ frequencyHz: 2000 }))} />);
    const words = text(html);
    const blocks = words.indexOf("Blocks publishing");
    expect(blocks).toBeGreaterThan(-1);
    expect(blocks).toBeLessThan(words.indexOf("Note"));
    expect(words).toContain("■ Blocks publishing · Pulses overlap");
    expect(words).toContain("Source: Standard circuit arithmetic");
    expect(words).toContain("some of these figures mean little");
  });

  it("shows the figures and both drawings for settings that parse", () => {
    const html = renderToStaticMarkup(<StimPicture analysis={analyseChannel(demoChannel())} />);
    // Two drawings, each in a wide and a narrow layout.
    expect(html.match(/role="img"/g)).toHaveLength(4);
    expect(text(html)).toContain("Shannon k (information only)");
    expect(html).toContain("tabular-nums");
  });

  it("keeps the findings but leaves out the drawings when the settings do not parse", () => {
    const html = renderToStaticMarkup(<StimPicture analysis={analyseChannel({ ...demoChannel(), sessionMinutes: 0 })} />);
    expect(html).not.toContain('role="img"');
    expect(text(html)).toContain("A value is out of range");
  });
});
