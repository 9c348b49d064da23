// No "use client": usable in server-rendered handouts as well as the live builder.
import { pulseGeometry, type PulseInput } from "./pulse-geometry";
import { PulseSvg, pulseLayout } from "./pulse-svg";
import { BREAK_NOTE, describePulse, hz, ma, partName, us } from "./pulse-text";
import { NARROW_VIEW, RESPONSIVE_CLASSES, WIDE_VIEW } from "./svg-text";

export type PulseShapeProps = PulseInput & { title?: string; layout?: "responsive" | "wide" | "narrow" };

const cell = "px-2 py-1 text-right";

// One pulse period: the phases to scale with one another, the gap to the next pulse to scale or behind an axis
// break when it would squash the pulse to a hairline (at 35 Hz the period is about 50 times a 600 µs pulse).
export function PulseShape({ title = "One pulse and the gap to the next", layout = "responsive", ...input }: PulseShapeProps) {
  // Whether the axis breaks does not depend on the view-box width, so either layout's geometry will do here.
  const geometry = pulseGeometry(input, pulseLayout(WIDE_VIEW));
  const drawing = { input, title, description: describePulse(input, geometry) };
  return (
    <figure className="flex flex-col gap-2">
      {layout !== "narrow" ? <PulseSvg {...drawing} width={WIDE_VIEW} className={layout === "responsive" ? RESPONSIVE_CLASSES.wide : ""} /> : null}
      {layout !== "wide" ? <PulseSvg {...drawing} width={NARROW_VIEW} className={layout === "responsive" ? RESPONSIVE_CLASSES.narrow : ""} /> : null}
      {geometry.broken ? <p className="text-sm text-ink-soft">{BREAK_NOTE}</p> : null}
      <table className="w-full text-sm tabular-nums">
        <caption className="text-left text-ink-soft">One pulse in figures</caption>
        <thead>
          <tr>
            <th scope="col" className="border-b border-line px-2 py-1 text-left">Part</th>
            <th scope="col" className={`border-b border-line ${cell}`}>Duration</th>
            <th scope="col" className={`border-b border-line ${cell}`}>Amplitude</th>
          </tr>
        </thead>
        <tbody>
          {geometry.parts.map((part) => (
            <tr key={`${part.kind}-${part.phase ?? ""}`}>
              <th scope="row" className="px-2 py-1 text-left font-normal">{partName(part)}</th>
              <td className={cell}>{us(part.durationUs)}</td>
              <td className={cell}>{ma(part.currentMa)}</td>
            </tr>
          ))}
          <tr>
            <th scope="row" className="border-t border-line px-2 py-1 text-left">Period ({hz(input.periodUs)})</th>
            <td className={`border-t border-line font-bold ${cell}`}>{us(input.periodUs)}</td>
            <td className={`border-t border-line ${cell}`}>—</td>
          </tr>
        </tbody>
      </table>
    </figure>
  );
}
