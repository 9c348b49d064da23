import { describe, expect, it } from "vitest";
import { figureGroups } from "@/components/stim-picture/figure-groups";
import { formatFigure, formatRatio, formatShare, withUnit } from "@/components/stim-picture/format";
import { analyseChannel } from "@/lib/stim";
import { demoChannel, round } from "../stim/helpers";

const NBSP = "\u00a0";
const rowValue = (input: unknown, id: string) => {
  const derived = analyseChannel(input).derived!;
  return figureGroups(derived).flatMap((g) => g.rows).find((r) => r.id === id)?.value.replaceAll(NBSP, " ");
};

describe("figure formatting", () => {
  it("shows four significant figures below 1,000 and whole numbers with British grouping above", () => {
    expect(formatFigure(7.24568)).toBe("7.246");
    expect(formatFigure(0.357496)).toBe("0.3575");
    expect(formatFigure(28571.43)).toBe("28,571");
    expect(formatFigure(-40)).toBe("\u221240");
    expect(formatFigure(-1e-12, { maxFractionDigits: 2 })).toBe("0");
    expect(formatFigure(null)).toBe("—");
    expect(formatFigure(Number.NaN)).toBe("—");
  });

  it("keeps units, shares and ratios readable", () => {
    expect(withUnit(300, "µs")).toBe(`300${NBSP}µs`);
    expect(withUnit(null, "mA")).toBe("—");
    expect(formatShare(0.25925)).toBe("25.9%");
    expect(formatRatio(2.857)).toBe(`1${NBSP}:${NBSP}2.9`);
    expect(formatRatio(null)).toBe("—");
  });
});

describe("figure groups", () => {
  it("puts the figures in the five groups, in order", () => {
    const groups = figureGroups(analyseChannel(demoChannel()).derived!);
    expect(groups.map((g) => g.title)).toEqual(["Pulse", "Current and charge", "Density and power", "Cycle and session", "Dose"]);
    for (const g of groups) for (const r of g.rows) expect(r.explanation.length).toBeGreaterThan(10);
  });

  it("shows the REFERENCES check values for symmetric biphasic 50 mA, 300 µs, 35 Hz on 2 in rounds", () => {
    const input = demoChannel({ amplitudeCeilingMa: 50, phaseDurationUs: 300, frequencyHz: 35, electrodes: [round(2, "in"), round(2, "in")] });
    // source: REFERENCES.md check values (our own arithmetic): I_rms 7.246 mA
    expect(rowValue(input, "rms-train")).toBe("7.246 mA");
    // source: REFERENCES.md check values (our own arithmetic): 0.3575 mA/cm²
    expect(rowValue(input, "current-density")).toBe("0.3575 mA/cm²");
    // source: REFERENCES.md check values, 2 in round = 20.268 cm², shown to four figures
    expect(rowValue(input, "area-1")).toBe("20.27 cm²");
  });

  it("shows the 100 mA, 400 µs check value's energy per phase", () => {
    // source: REFERENCES.md check values (arithmetic): 100 mA, 400 µs into 500 Ω is 2.000 mJ per phase
    expect(rowValue(demoChannel({ amplitudeCeilingMa: 100, phaseDurationUs: 400, frequencyHz: 50 }), "energy-per-phase")).toBe("2 mJ");
  });

  it("labels Shannon k as information only", () => {
    const rows = figureGroups(analyseChannel(demoChannel()).derived!).flatMap((g) => g.rows);
    const shannon = rows.find((r) => r.id === "shannon-k");
    expect(shannon?.label).toMatch(/information only/i);
    expect(shannon?.explanation).toMatch(/not a skin limit/i);
  });

  it("lists the largest phase charge only when the phases differ", () => {
    const ids = (input: unknown) => figureGroups(analyseChannel(input).derived!).flatMap((g) => g.rows.map((r) => r.id));
    expect(ids(demoChannel())).not.toContain("max-phase-charge");
    // Demo asymmetric pulse (invented): 40 mA × 300 µs against 10 mA × 1,500 µs, so the second phase carries more.
    const asymmetric = demoChannel({ waveform: { kind: "asymmetric-balanced-biphasic", secondPhaseAmplitudeMa: 10, secondPhaseDurationUs: 1500 } });
    expect(ids(asymmetric)).toContain("max-phase-charge");
  });
});
