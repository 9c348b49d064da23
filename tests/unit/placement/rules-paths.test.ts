import { describe, expect, it } from "vitest";
import { PLACEMENT_SOURCES } from "@/lib/placement";
import { at, codesFor, findingFor } from "./helpers";

describe("placement-across-chest (blocks)", () => {
  it("blocks a channel from one side of the chest to the other", () => {
    const f = findingFor(at("front-chest-left"), at("front-chest-right"), "placement-across-chest");
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): transthoracic stimulation is warned against
    expect(f.severity).toBe("blocks");
    expect(f.source).toBe(PLACEMENT_SOURCES.iecTransthoracic);
    expect(f.electrodes).toEqual([0, 1]);
  });

  it("counts the front of the shoulder and the back of the chest as chest area", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): transthoracic; the front of the shoulder as chest area
    expect(codesFor(at("left-shoulder-anterior"), at("front-chest-right"))).toContain("placement-across-chest");
    // from memory, unverified: the shoulder blades and the back below them lie over the thorax
    expect(codesFor(at("back-scapula-left"), at("back-mid-right"))).toContain("placement-across-chest");
  });

  it("is absent when both electrodes are on the same side", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES)
    expect(codesFor(at("front-chest-left"), at("left-shoulder-anterior"))).not.toContain("placement-across-chest");
  });
});

describe("placement-across-arms (blocks)", () => {
  it("blocks a channel from one arm to the other", () => {
    const f = findingFor(at("left-forearm-dorsal"), at("right-forearm-dorsal"), "placement-across-arms");
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): transthoracic; an arm-to-arm path crossing the chest
    // is Rampline's reading of it
    expect(f.severity).toBe("blocks");
    expect(f.explanation).toContain("Electrode A is on the left arm and electrode B on the right arm");
    expect(codesFor(at("right-thenar"), at("left-upper-arm-anterior"))).toContain("placement-across-arms");
  });

  it("is absent for two markers on one arm, even in different views", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): the path stays in the limb
    expect(codesFor(at("left-upper-arm-anterior"), at("left-upper-arm-posterior"))).toEqual([]);
  });
});

describe("placement-across-midline (blocks)", () => {
  it("blocks any other left-to-right path in the upper body", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): transthoracic; that a left-to-right path in the upper
    // body crosses or runs close to the chest is Rampline's reading
    expect(findingFor(at("left-forearm-dorsal"), at("back-scapula-right"), "placement-across-midline").severity).toBe("blocks");
    expect(codesFor(at("back-upper-trapezius-left"), at("back-upper-trapezius-right"))).toContain("placement-across-midline");
    expect(codesFor(at("front-abdomen-left"), at("front-abdomen-right"))).toContain("placement-across-midline");
  });

  it("is absent when one electrode is on the midline", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES); the back of the neck is judged by its own warning
    expect(codesFor(at("back-neck"), at("back-upper-trapezius-right"))).not.toContain("placement-across-midline");
  });

  it("gives only the most specific path finding", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES)
    const codes = codesFor(at("left-shoulder-anterior"), at("right-shoulder-anterior"));
    expect(codes.filter((c) => c.startsWith("placement-across"))).toEqual(["placement-across-chest"]);
  });
});

describe("placement-chest-front-to-back (blocks)", () => {
  it("blocks a channel from the front of the chest to the back of the chest", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): transthoracic; front to back read as transthoracic
    expect(findingFor(at("front-chest-left"), at("back-scapula-left"), "placement-chest-front-to-back").severity).toBe("blocks");
  });

  it("is absent front to back through the shoulder", () => {
    // common practice (no published source): anterior and posterior deltoid on one shoulder is a shoulder placement
    expect(codesFor(at("left-shoulder-anterior"), at("left-deltoid"))).toEqual([]);
  });
});
