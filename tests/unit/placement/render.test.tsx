import { readFileSync } from "node:fs";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { BodyOutline, type OutlineChannel } from "@/components/body-outline";
import { at } from "./helpers";

const text = (html: string) => html.replace(/<[^>]+>/g, " ").replace(/&#x27;/g, "'").replace(/\s+/g, " ");
const extensors: OutlineChannel = { id: "c1", label: "Channel 1", markers: [at("left-forearm-dorsal"), { view: "back", x: 90, y: 440 }] };
const shoulder: OutlineChannel = { id: "c2", label: "Channel 2", markers: [at("back-upper-trapezius-left"), at("left-deltoid")] };
const noop = () => {};

describe("BodyOutline, read-only (handout and client's view)", () => {
  it("draws each view as an image with a title and a description in words", () => {
    const html = renderToStaticMarkup(<BodyOutline readOnly channels={[extensors, shoulder]} views={["front", "back"]} />);
    expect(html.match(/<svg[^>]*role="img"[^>]*aria-labelledby="[^"]+-title"[^>]*aria-describedby="[^"]+-desc"/g)).toHaveLength(2);
    const words = text(html);
    expect(words).toContain("Front view, the client facing you: their left side is on your right.");
    expect(words).toContain("Channel 1: electrode A on Left forearm, back of the arm (wrist and finger extensors)");
    expect(words).toContain("Client's left");
    // The marker carries its channel number and letter, so it never depends on colour.
    expect(html).toContain(">1A</text>");
    expect(html).toContain(">2B</text>");
    expect(html).not.toContain('role="slider"');
    expect(html).not.toContain("aria-live");
  });

  it("draws only the views that hold a marker unless told otherwise", () => {
    const html = renderToStaticMarkup(<BodyOutline readOnly channels={[extensors]} />);
    expect(html.match(/role="img"/g)).toHaveLength(1);
    expect(text(html)).toContain("Back view, the client seen from behind");
  });

  it("keeps the read-only drawing free of client-only code, so it renders on the server", () => {
    const files = [
      "body-outline.tsx", "body-outline-read-only.tsx", "channel-marks.tsx", "channel-line.tsx", "marker-glyph.tsx",
      "marker-list.tsx", "outline-body.tsx", "outline-details.tsx", "describe-view.ts", "marker-text.ts",
      "channel-style.ts", "marker-geometry.ts",
    ];
    for (const file of files) {
      const source = readFileSync(new URL(`../../../components/body-outline/${file}`, import.meta.url), "utf8");
      expect(source, file).not.toMatch(/^"use client"|\bwindow\.|\bdocument\.|useEffect|useState|useRef/m);
    }
  });
});

describe("BodyOutline, editing", () => {
  const render = (channels: OutlineChannel[], active = "c1") =>
    renderToStaticMarkup(<BodyOutline channels={channels} activeChannelId={active} onChange={noop} />);

  it("makes each marker of the active channel a named, keyboard-operable control", () => {
    const html = render([extensors, shoulder]);
    const sliders = [...html.matchAll(/<g role="slider"[^>]*>/g)].map((m) => m[0]);
    expect(sliders).toHaveLength(2); // channel 2 is drawn, but only the active channel's markers take the focus
    expect(sliders[0]).toContain('tabindex="0"');
    expect(sliders[0]).toContain('aria-label="Channel 1, electrode A, on Left forearm, back of the arm (wrist and finger extensors)"');
    expect(sliders[0]).toMatch(/aria-valuetext="\d+% across, \d+% down the back view"/);
    expect(sliders[0]).toMatch(/aria-describedby="[^"]+-hint"/);
    expect(html).toContain('aria-live="polite"');
  });

  it("offers front and back as tabs, opening on the view that holds the active channel's markers", () => {
    const html = render([extensors]);
    expect(html).toContain('role="tablist"');
    expect(html).toMatch(/<button[^>]*role="tab"[^>]*aria-selected="true"[^>]*tabindex="0"[^>]*>.*?Back/);
    expect(html).toMatch(/<button[^>]*role="tab"[^>]*aria-selected="false"[^>]*tabindex="-1"[^>]*>.*?Front/);
    expect(html).toMatch(/role="tabpanel"[^>]*aria-labelledby="[^"]+-tab-back"/);
  });

  it("lists the markers in words with controls to place, move and remove them", () => {
    const html = render([{ ...extensors, markers: [extensors.markers[0], null] }]);
    const words = text(html);
    expect(words).toContain("Electrode A: Left forearm, back of the arm (wrist and finger extensors) (back view)");
    expect(words).toContain("Electrode B: not placed yet");
    expect(html).toMatch(/<label[^>]*>Place electrode B on<\/label><select/);
    expect(words).toContain("Remove electrode A");
    expect(words).not.toContain("Remove electrode B");
  });

  it("shows the active channel's placement findings with icon, word and source", () => {
    const html = render([{ id: "c1", label: "Channel 1", markers: [at("front-neck"), at("front-chest-left")] }]);
    const words = text(html);
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): the front of the neck is warned against
    expect(words).toContain("■ Blocks publishing · Electrode on the front of the neck");
    expect(words).toContain("Source: IEC 60601-2-10:2012");
    // common practice (no published source): the chest warning
    expect(words).toContain("▲ Warning · Electrode on the front of the chest");
    expect(words.indexOf("Blocks publishing")).toBeLessThan(words.indexOf("▲ Warning"));
    expect(words).toContain("The treating clinician decides");
  });

  it("says there is nothing to check for a usual placement", () => {
    // common practice (no published source): two markers on the extensors, well apart
    expect(text(render([extensors]))).toContain("Channel 1: nothing to check in the placement.");
  });
});
