"use client";
import { useId } from "react";
import { interphaseGapUs, type ChannelAnalysis } from "@/lib/stim";
import { CycleRibbon } from "./cycle-ribbon";
import { DerivedFigures } from "./derived-figures";
import { FindingsList } from "./findings-list";
import { PulseShape } from "./pulse-shape";

// The picture of one channel's settings, a pure function of the analysis: findings first (blocks on top), then the
// two drawings, then every derived figure. The host page supplies the h2; sections here are h3.
export function StimPicture({ analysis }: { analysis: ChannelAnalysis }) {
  const { settings, derived } = analysis;
  // The builder shows one picture per channel, so heading ids must not repeat on a page.
  const id = useId();
  const ids = { findings: `${id}-findings`, cycle: `${id}-cycle`, pulse: `${id}-pulse`, figures: `${id}-figures` };
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby={ids.findings} className="flex flex-col gap-2">
        <h3 id={ids.findings} className="text-xl">Findings</h3>
        <FindingsList findings={analysis.findings} />
      </section>
      {settings && derived ? (
        <>
          <section aria-labelledby={ids.cycle} className="flex flex-col gap-2">
            <h3 id={ids.cycle} className="text-xl">The cycle</h3>
            <CycleRibbon rampUpS={settings.rampUpS} holdS={settings.holdS} rampDownS={settings.rampDownS} restS={settings.restS} />
          </section>
          <section aria-labelledby={ids.pulse} className="flex flex-col gap-2">
            <h3 id={ids.pulse} className="text-xl">One pulse</h3>
            <PulseShape phases={derived.pulse.phases} interphaseGapUs={interphaseGapUs(settings.waveform)} periodUs={derived.pulse.periodUs} />
          </section>
          <section aria-labelledby={ids.figures} className="flex flex-col gap-2">
            <h3 id={ids.figures} className="text-xl">Figures</h3>
            <p className="text-ink-soft">
              Worked out at the amplitude ceiling, the most the client may turn up to.
              {analysis.ok ? null : " A setting blocks publishing, so some of these figures mean little until it is corrected."}
            </p>
            <DerivedFigures derived={derived} />
          </section>
        </>
      ) : (
        <p className="rounded-md border-2 border-dashed border-line p-4 text-ink-soft">
          The drawings and figures appear once every setting has a value Rampline can read. The findings above say which
          settings need attention.
        </p>
      )}
    </div>
  );
}
