import convert from "convert-units";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  CM_PER_INCH,
  averagePowerMw,
  electrodeAreaCm2,
  phaseChargeUc,
  smallestElectrodeAreaCm2,
  toCm,
  type Electrode,
} from "@/lib/stim";
import { expectRelClose, round, square } from "./helpers";

// convert-units goes through feet and metres with a rounded ratio (3.28084 ft/m), so it agrees with the
// exact 2.54 cm/in to about 1e-6 relative: this tolerance allows for that and nothing more.
const LIB_TOL = 1e-5;

const inches = fc.double({ min: 0.25, max: 8, noNaN: true });

describe("units against convert-units", () => {
  it("inches to centimetres", () => {
    // source: convert-units (npm) as an independent reference
    expectRelClose(toCm(1, "in"), convert(1).from("in").to("cm"), LIB_TOL);
    expect(CM_PER_INCH).toBe(2.54);
    fc.assert(
      fc.property(inches, (v) => {
        // source: convert-units (npm) as an independent reference
        expectRelClose(toCm(v, "in"), convert(v).from("in").to("cm"), LIB_TOL);
      }),
    );
  });

  it("square, round and rectangular areas in inches, via in² → cm²", () => {
    fc.assert(
      fc.property(inches, inches, (a, b) => {
        // source: convert-units (npm) as an independent reference
        expectRelClose(electrodeAreaCm2(square(a, "in")), convert(a * a).from("in2").to("cm2"), LIB_TOL);
        // source: convert-units (npm) as an independent reference
        expectRelClose(
          electrodeAreaCm2({ shape: "rectangle", width: a, length: b, unit: "in" }),
          convert(a * b).from("in2").to("cm2"),
          LIB_TOL,
        );
        // source: convert-units (npm) as an independent reference; circle area π(d/2)²
        expectRelClose(electrodeAreaCm2(round(a, "in")), convert(Math.PI * (a / 2) ** 2).from("in2").to("cm2"), LIB_TOL);
      }),
    );
  });

  it("centimetre sizes are used as they are", () => {
    // source: convert-units (npm) as an independent reference
    expectRelClose(electrodeAreaCm2(square(5)), convert(2500).from("mm2").to("cm2"), LIB_TOL);
  });

  it("charge and power helpers agree with the library's mA → A, µs → s and W → mW", () => {
    const amps = convert(50).from("mA").to("A");
    const seconds = convert(300).from("mu").to("s");
    // source: convert-units (npm) as an independent reference; Q = I·t
    expectRelClose(phaseChargeUc(50, 300), amps * seconds * 1e6, LIB_TOL);
    // source: convert-units (npm) as an independent reference; P = I²·R at 500 Ω
    expectRelClose(averagePowerMw(20), convert(convert(20).from("mA").to("A") ** 2 * 500).from("W").to("mW"), LIB_TOL);
  });
});

describe("electrode areas", () => {
  it("the same electrode typed in cm or in has the same area", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic); 1 in = 2.54 cm exactly
    expectRelClose(electrodeAreaCm2(round(5.08)), electrodeAreaCm2(round(2, "in")), 1e-12);
  });

  it("a 1.25 in round, the usual thumb electrode, is about 7.92 cm²", () => {
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(electrodeAreaCm2(round(1.25, "in")), Math.PI * (1.25 * 1.27) ** 2);
    // source: convert-units (npm) as an independent reference
    expectRelClose(electrodeAreaCm2(round(1.25, "in")), convert(Math.PI * 0.625 ** 2).from("in2").to("cm2"), LIB_TOL);
  });

  it("the smallest area is the one the densities use", () => {
    const pair: Electrode[] = [{ shape: "rectangle", width: 5, length: 9, unit: "cm" }, round(2, "in")];
    // source: our own arithmetic from the formulas in REFERENCES (standard circuit arithmetic)
    expectRelClose(smallestElectrodeAreaCm2(pair), 20.268);
  });
});
