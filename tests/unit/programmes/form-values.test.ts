import { describe, expect, it } from "vitest";
import { programmeContentSchema } from "@/lib/programmes/content";
import { contentToFormValues, emptyProgramme, formValuesToContentInput } from "@/lib/programmes/form-values";
import { BUILT_IN_TEMPLATES, programmeFromTemplate } from "@/lib/programmes/templates";
import { analyseChannel } from "@/lib/stim";
import { sampleContent } from "./fixtures";

describe("the builder's form values", () => {
  it("turn a published version back into the same content", () => {
    const content = sampleContent();
    const again = programmeContentSchema.parse(formValuesToContentInput(contentToFormValues(content)));
    expect(again).toEqual(content);
  });

  it("do not pass as a programme while empty, and say what is missing", () => {
    const result = programmeContentSchema.safeParse(formValuesToContentInput(emptyProgramme(new Date("2026-12-01"))));
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((issue) => issue.path.join("."));
    expect(paths).toContain("channels.0.target");
    expect(paths).toContain("channels.0.markers");
    expect(paths).toContain("channels.0.settings.frequencyHz");
  });

  it("set the first review two weeks ahead", () => {
    expect(emptyProgramme(new Date("2026-12-01T10:00:00Z")).schedule.reviewOn).toBe("2026-12-15");
  });
});

describe("the built-in templates", () => {
  for (const template of BUILT_IN_TEMPLATES) {
    it(`"${template.name}" has settings that pass the computation without a blocking finding`, () => {
      const values = programmeFromTemplate(template.channels, new Date("2026-12-01"));
      expect(values.channels.map((c) => c.id)).toEqual(template.channels.map((_, i) => `ch-${i + 1}`));
      const content = formValuesToContentInput(values) as { channels: { settings: Record<string, unknown> }[] };
      for (const channel of content.channels) {
        const analysis = analyseChannel({ ...channel.settings, sessionMinutes: 30, sessionsPerDay: 1, daysPerWeek: 5 });
        expect(analysis.fieldErrors).toEqual({});
        expect(analysis.findings.filter((f) => f.severity === "blocks")).toEqual([]);
      }
    });
  }

  it("stay within the trade's usual ranges: 20–50 Hz and 200–300 µs", () => {
    // common practice (no published source): 20–50 Hz for a sustained contraction, 250–300 µs usual, shorter
    // pulses for the small hand muscles.
    for (const template of BUILT_IN_TEMPLATES) {
      for (const channel of template.channels) {
        expect(Number(channel.settings.frequencyHz)).toBeGreaterThanOrEqual(20);
        expect(Number(channel.settings.frequencyHz)).toBeLessThanOrEqual(50);
        expect(Number(channel.settings.phaseDurationUs)).toBeGreaterThanOrEqual(200);
        expect(Number(channel.settings.phaseDurationUs)).toBeLessThanOrEqual(300);
      }
    }
  });
});
