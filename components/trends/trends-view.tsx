import { channelStyle } from "@/components/body-outline/channel-style";
import { Card } from "@/components/ui/card";
import { SKIN_LEVELS, SKIN_SCALE } from "@/lib/check-ins/skin-scale";
import { LOW_COMFORT, REVIEW_SKIN_LEVEL } from "@/lib/rules/check-in-rules";
import type { Trends } from "@/lib/trends";
import { AdherenceChart } from "./adherence-chart";
import { AdherenceTable } from "./adherence-table";
import { AmplitudeChart } from "./amplitude-chart";
import { AmplitudeTable } from "./amplitude-table";
import { ChartSection } from "./chart-section";
import { ComfortChart } from "./comfort-chart";
import { SeriesKey, versionKeyItem, type KeyItem } from "./series-key";
import { ComfortTable, SkinTable } from "./session-tables";
import { SkinChart } from "./skin-chart";

const TITLES = {
  amplitude: "Amplitude reached per channel",
  comfort: "Comfort after each session",
  skin: "Skin: the worst level per session",
  adherence: "Adherence per week",
};
const thresholdItem = (label: string): KeyItem => ({ label, dash: "8 4", thin: true });

// The four charts of the trends page, each with its summary, key and table. Shaped on the server (lib/trends);
// only the drawings run in the browser.
export function TrendsView({ clientId, trends }: { clientId: string; trends: Trends }) {
  const { axis, markers, channels, amplitude, sessions, adherence } = trends;
  const amplitudeKey: KeyItem[] = [
    ...channels.flatMap((channel) => {
      const style = channelStyle(channel.index);
      return [
        { label: `${channel.label}, amplitude reached`, dash: style.dash, shape: style.shape },
        { label: `${channel.shortLabel}, ceiling of the version in force`, dash: style.dash, thin: true },
      ];
    }),
    { label: "Filled, ringed marker: above that session's ceiling", shape: "circle", ringed: true },
    versionKeyItem,
  ];
  return (
    <div className="flex flex-col gap-6">
      <ChartSection
        id="amplitude"
        title={TITLES.amplitude}
        summary={amplitude.summary}
        chart={<AmplitudeChart axis={axis} markers={markers} channels={channels} amplitude={amplitude} title={TITLES.amplitude} summary={amplitude.summary} />}
        chartKey={<SeriesKey label="Key to the amplitude chart" items={amplitudeKey} />}
        tableLabel="Amplitude as a table"
        table={<AmplitudeTable clientId={clientId} rows={amplitude.rows} channels={channels} />}
      />
      <ChartSection
        id="comfort"
        title={TITLES.comfort}
        summary={sessions.comfortSummary}
        chart={<ComfortChart axis={axis} markers={markers} rows={sessions.rows} title={TITLES.comfort} summary={sessions.comfortSummary} />}
        chartKey={<SeriesKey label="Key to the comfort chart" items={[{ label: "Comfort, 0 to 10", shape: "circle" }, thresholdItem(`Low comfort, at ${LOW_COMFORT}: two sessions in a row at ${LOW_COMFORT} or less raise a flag`), versionKeyItem]} />}
        tableLabel="Comfort as a table"
        table={<ComfortTable clientId={clientId} rows={sessions.rows} />}
      />
      <ChartSection
        id="skin"
        title={TITLES.skin}
        summary={sessions.skinSummary}
        chart={<SkinChart axis={axis} markers={markers} rows={sessions.rows} title={TITLES.skin} summary={sessions.skinSummary} />}
        chartKey={
          <div className="flex flex-col gap-3">
            <SeriesKey label="Key to the skin chart" items={[{ label: "Worst level under any electrode", shape: "circle" }, thresholdItem(`Review level, at ${REVIEW_SKIN_LEVEL}: a session at ${REVIEW_SKIN_LEVEL} or above raises a flag`), versionKeyItem]} />
            <ol aria-label="The skin levels" className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
              {SKIN_LEVELS.map((level) => (
                <li key={level}>
                  <span className="font-bold tabular-nums">{level}</span> {SKIN_SCALE[level].words}
                </li>
              ))}
            </ol>
          </div>
        }
        tableLabel="Skin levels as a table"
        table={<SkinTable clientId={clientId} rows={sessions.rows} />}
      />
      {adherence.rows.length === 0 ? (
        <Card title={TITLES.adherence}>
          <p>{adherence.summary}</p>
        </Card>
      ) : (
        <ChartSection
          id="adherence"
          title={TITLES.adherence}
          summary={adherence.summary}
          chart={<AdherenceChart rows={adherence.rows} title={TITLES.adherence} summary={adherence.summary} />}
          chartKey={
            <div className="flex flex-col gap-2">
              <SeriesKey label="Key to the adherence chart" items={[{ label: "Sessions done ÷ prescribed", bar: "solid" }, { label: "Minutes done ÷ prescribed", bar: "hatched" }]} />
              <p className="text-sm">Bars stop at 100%. A chevron over a bar means more was done than prescribed; the real share is written above it where there is room, and always in the tooltip and the table.</p>
            </div>
          }
          tableLabel="Adherence as a table"
          table={<AdherenceTable rows={adherence.rows} />}
        />
      )}
    </div>
  );
}
