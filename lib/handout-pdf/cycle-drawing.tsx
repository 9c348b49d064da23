import { G, Line, Polygon, Svg, Text, View } from "@react-pdf/renderer";
import { axisTicks } from "@/components/stim-picture/axis-ticks";
import { cycleSeconds, cycleSegments, ribbonPoints, timeToX, type CycleSegment, type CycleTimes } from "@/components/stim-picture/cycle-geometry";
import { PART_NAMES } from "@/components/stim-picture/cycle-text";
import { formatFigure } from "@/components/stim-picture/format";
import { Words } from "./blocks";
import { COLOURS, CONTENT_WIDTH, TYPE } from "./theme";

// The cycle ribbon of the app, drawn for paper: one cycle to scale in seconds, from the same geometry the builder
// and the session timer use, so the three pictures of a programme always agree.

const WIDTH = CONTENT_WIDTH;
const HEIGHT = 112;
const PLOT = { x0: 10, x1: WIDTH - 10 };
const BAND = { baseY: 66, restThickness: 5, fullHeight: 48 };
const LABEL_SIZE = TYPE.small;
// Helvetica averages a little over half an em per character; erring wide keeps a label from running over its part.
const labelWidth = (text: string) => text.length * LABEL_SIZE * 0.56;

const seconds = (s: number) => `${formatFigure(s, { maxFractionDigits: 2 })} s`;

export function partLabel(segment: CycleSegment): string | null {
  const width = segment.x1 - segment.x0;
  const long = `${PART_NAMES[segment.part].toLowerCase()} ${seconds(segment.endS - segment.startS)}`;
  if (labelWidth(long) + 6 <= width) return long;
  const short = seconds(segment.endS - segment.startS);
  return labelWidth(short) + 4 <= width ? short : null;
}

// The same seconds in words, always complete, for the parts too narrow to carry a label in the drawing.
export function cycleInWords(times: CycleTimes): string {
  return (
    `One cycle: ramp-up ${seconds(times.rampUpS)}, hold at full strength ${seconds(times.holdS)}, ` +
    `ramp-down ${seconds(times.rampDownS)}, rest ${seconds(times.restS)}; ${seconds(cycleSeconds(times))} in all.`
  );
}

export function CycleDrawing({ times }: { times: CycleTimes }) {
  const totalS = cycleSeconds(times);
  if (!(totalS > 0)) return <Words>{cycleInWords(times)}</Words>;
  const points = ribbonPoints(times, 1, PLOT, BAND)
    .map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`)
    .join(" ");
  const axisY = BAND.baseY + 24;
  return (
    <View wrap={false}>
      <Svg width={WIDTH} height={HEIGHT} viewBox={`0 0 ${WIDTH} ${HEIGHT}`}>
        <Polygon points={points} fill={COLOURS.note} stroke={COLOURS.note} strokeWidth={1.5} strokeLinejoin="round" />
        {cycleSegments(times, 1, PLOT).map((segment) => {
          const label = partLabel(segment);
          return label ? (
            <Text
              key={segment.part}
              x={(segment.x0 + segment.x1) / 2}
              y={BAND.baseY + 15}
              textAnchor="middle"
              fill={COLOURS.ink}
              style={{ fontSize: LABEL_SIZE }}
            >
              {label}
            </Text>
          ) : null;
        })}
        <Line x1={PLOT.x0} x2={PLOT.x1} y1={axisY} y2={axisY} stroke={COLOURS.ink} strokeWidth={1} />
        {axisTicks(totalS, 8).map((tick) => {
          const x = timeToX(tick, totalS, PLOT);
          return (
            <G key={tick}>
              <Line x1={x} x2={x} y1={axisY} y2={axisY + 5} stroke={COLOURS.ink} strokeWidth={1} />
              <Text x={x} y={axisY + 17} textAnchor="middle" fill={COLOURS.ink} style={{ fontSize: LABEL_SIZE }}>
                {formatFigure(tick, { maxFractionDigits: 2 })}
              </Text>
            </G>
          );
        })}
      </Svg>
      <Words style={{ fontSize: TYPE.small, textAlign: "right" }}>time in seconds</Words>
      <Words>{cycleInWords(times)}</Words>
    </View>
  );
}
