import { describe, expect, it } from "vitest";
import { channelsAcross } from "@/lib/trends/channels";
import { sessionRows } from "@/lib/trends/sessions";
import { placeCheckIns } from "@/lib/trends/timeline";
import { worstSkin } from "@/lib/trends";
import { checkIn, version } from "./fixtures";

describe("the worst skin level of a session", () => {
  it("is the highest level under any electrode, naming every electrode at that level", () => {
    const worst = worstSkin([
      { channelId: "ch-1", electrode: "A", level: 2 },
      { channelId: "ch-1", electrode: "B", level: 3 },
      { channelId: "ch-2", electrode: "A", level: 1 },
      { channelId: "ch-2", electrode: "B", level: 3 },
    ]);
    expect(worst).toEqual({
      level: 3,
      sites: [
        { channelId: "ch-1", electrode: "B" },
        { channelId: "ch-2", electrode: "B" },
      ],
    });
  });

  it("is level 1 when nothing changed anywhere, and absent when no electrode was checked", () => {
    expect(worstSkin([{ channelId: "ch-1", electrode: "A", level: 1 }, { channelId: "ch-1", electrode: "B", level: 1 }])?.level).toBe(1);
    expect(worstSkin([])).toBeNull();
  });

  it("refuses a level outside the five-level scale rather than drawing it", () => {
    expect(() => worstSkin([{ channelId: "ch-1", electrode: "A", level: 6 }])).toThrow(/1 to 5/);
  });

  it("names the sites by the channel numbers of the latest version", () => {
    // In v2 the channels swapped places, so ch-2 is now channel 1.
    const versions = [version(1, "2026-03-02", [["ch-1", 30], ["ch-2", 30]]), version(2, "2026-03-09", [["ch-2", 30], ["ch-1", 30]])];
    const session = checkIn("2026-03-10", { "ch-1": 20, "ch-2": 18 }, { versionNumber: 2 });
    session.skin = [
      { channelId: "ch-1", electrode: "A", level: 1 },
      { channelId: "ch-1", electrode: "B", level: 1 },
      { channelId: "ch-2", electrode: "A", level: 4 },
      { channelId: "ch-2", electrode: "B", level: 2 },
    ];
    const [row] = sessionRows(placeCheckIns([session]), channelsAcross(versions));
    expect(row?.worstSkinLevel).toBe(4);
    expect(row?.worstSkinSites).toEqual(["Channel 1, electrode A"]);
  });
});
