import { programmeContentSchema, type ProgrammeContent } from "@/lib/programmes/content";
import { DEFAULT_ELECTRODE_CARE, DEFAULT_SKIN_PREPARATION, STANDARD_CAUTIONS } from "@/lib/programmes/defaults";

// Invented demo programme used by the programme tests; its numbers are example values, not checks.
export function sampleContent(): ProgrammeContent {
  return programmeContentSchema.parse({
    channels: [
      {
        id: "ch-1",
        target: "Wrist and finger extensors",
        side: "left",
        electrodeType: "standard-gel",
        markers: [
          { view: "front", x: 100, y: 200 },
          { view: "front", x: 110, y: 240 },
        ],
        photoIds: [],
        settings: {
          frequencyHz: 35,
          phaseDurationUs: 300,
          waveform: { kind: "symmetric-biphasic" },
          rampUpS: 1,
          holdS: 5,
          rampDownS: 1,
          restS: 25,
          amplitudeCeilingMa: 30,
          electrodes: [
            { shape: "round", diameter: 2, unit: "in" },
            { shape: "round", diameter: 2, unit: "in" },
          ],
        },
      },
    ],
    schedule: { minutesPerSession: 30, sessionsPerDay: 1, daysPerWeek: 5, weeks: 6, reviewOn: "2027-01-15" },
    skinPreparation: DEFAULT_SKIN_PREPARATION,
    electrodeCare: DEFAULT_ELECTRODE_CARE,
    standardCautions: STANDARD_CAUTIONS,
    ownCautions: [],
  });
}
