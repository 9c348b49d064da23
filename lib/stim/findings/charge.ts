import type { ChannelDerived } from "../derive";
import type { ChannelSettings } from "../schema";
import { LIMIT_TOLERANCE } from "../units";
import { fmt } from "./format";
import { DEFER, SOURCES } from "./sources";
import type { Finding } from "./types";

/**
 * Warns when a pulse leaves a net charge. Zero means zero up to floating-point rounding: an asymmetric
 * waveform whose entered second phase does not balance the first is worth a second look at the figures.
 */
export function netChargeFindings(s: ChannelSettings, d: ChannelDerived): Finding[] {
  const net = d.pulse.netChargeUc;
  const first = d.pulse.phaseChargeUc;
  if (Math.abs(net) <= first * LIMIT_TOLERANCE) return [];
  const cause =
    s.waveform.kind === "monophasic"
      ? "A monophasic pulse flows in one direction only, so all of its charge is net charge."
      : `The second phase (${fmt(d.pulse.phases[1]?.chargeUc ?? 0, 3)} µC) does not balance the first ` +
        `(${fmt(first, 3)} µC); check the entered amplitude and duration against the device's specification.`;
  return [
    {
      code: "net-charge-not-zero",
      severity: "warning",
      title: "Net charge per pulse is not zero",
      explanation:
        `Each pulse leaves a net charge of ${fmt(Math.abs(net), 3)} µC at the amplitude ceiling. ${cause} ` +
        "Charge that does not balance out drives chemical changes at the skin under the electrodes, which " +
        `can irritate it over repeated sessions, so check the skin after each session. ${DEFER}`,
      source: SOURCES.netCharge,
      numbers: { netChargeUc: net, phaseChargeUc: first },
    },
  ];
}
