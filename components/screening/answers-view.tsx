import type { ReactNode } from "react";
import {
  APPLIER_LABELS,
  CARER_COMPETENCE_LABELS,
  MOVEMENT_LABELS,
  OUTCOME_LABELS,
  RED_FLAGS,
  SENSATION_METHOD_LABELS,
  SENSATION_RESULT_LABELS,
  SIDE_LABELS,
  SKIN_AFTER_LABELS,
  TOLERANCE_LABELS,
} from "@/lib/screening/questions";
import { CAPACITY_TEXT as CAP, CONTEXT_TEXT as CTX, OUTCOME_TEXT as OUT, SITE_TEXT as SITE, TEST_TEXT as TEST } from "@/lib/screening/field-text";
import type { AnswersDraft } from "@/lib/screening/rules";
import { AnswerRows, optionText, yesNoText } from "./answer-rows";
import { formatCalendarDate } from "./format";

const date = (iso: string | null | undefined) => (iso ? formatCalendarDate(iso) : undefined);

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-3 border-t border-line pt-4">
      <h3 className="text-lg">{title}</h3>
      {children}
    </section>
  );
}

// Every answer of one signed version, read-only, in the order of the form (sections A–F).
export function AnswersView({ answers }: { answers: AnswersDraft }) {
  const { context, redFlags, capacity, testStimulation: test, outcome } = answers;
  return (
    <div className="flex flex-col gap-6">
      <Section title="A. Context">
        <AnswerRows
          rows={[
            [CTX.diagnosis.show, context?.diagnosis],
            [CTX.affectedSide.show, optionText(SIDE_LABELS, context?.affectedSide)],
            [CTX.onsetDate.show, date(context?.onset?.date)],
            [CTX.timeSince.show, context?.onset?.timeSince],
            [CTX.appliedBy.show, optionText(APPLIER_LABELS, context?.appliedBy)],
            [CTX.carerPresent.show, yesNoText(context?.carerPresent)],
          ]}
        />
      </Section>
      <Section title="B. Systemic red flags">
        <AnswerRows rows={RED_FLAGS.map((flag) => [flag.label, yesNoText(redFlags?.[flag.key])])} />
      </Section>
      <Section title="C. Electrode sites">
        {(answers.sites ?? []).map((site, index) => (
          <div key={index} className="flex flex-col gap-2">
            <h4 className="font-bold">
              Site {index + 1}: {site?.name ?? "no name"}
            </h4>
            <AnswerRows
              rows={[
                [SITE.skinIntact.show, yesNoText(site?.skinIntact)],
                [SITE.sensationMethod.show, optionText(SENSATION_METHOD_LABELS, site?.sensationMethod)],
                [SITE.sensationResult.show, optionText(SENSATION_RESULT_LABELS, site?.sensationResult)],
                [SITE.clotHistory.show, yesNoText(site?.clotHistory)],
                [SITE.malignancyOrRadiotherapy.show, yesNoText(site?.malignancyOrRadiotherapy)],
                [SITE.recentFractureOrSurgery.show, yesNoText(site?.recentFractureOrSurgery)],
                [SITE.swelling.show, yesNoText(site?.swelling)],
                [SITE.metalwork.show, yesNoText(site?.metalwork)],
                [SITE.clearOfNeckAndChest.show, yesNoText(site?.clearOfNeckAndChest)],
                [SITE.notes.show, site?.notes ?? "None"],
              ]}
            />
          </div>
        ))}
      </Section>
      <Section title="D. Capacity to self-manage">
        <AnswerRows
          rows={[
            [CAP.understanding.show, yesNoText(capacity?.understanding)],
            [CAP.dexterity.show, yesNoText(capacity?.dexterity)],
            [CAP.carerCompetence.show, optionText(CARER_COMPETENCE_LABELS, capacity?.carerCompetence)],
          ]}
        />
      </Section>
      <Section title="E. Test stimulation in clinic">
        <AnswerRows
          rows={
            test?.done === "no"
              ? [
                  [TEST.done.show, "Not done"],
                  [TEST.notDoneReason.show, test.notDoneReason],
                ]
              : [
                  [TEST.done.show, yesNoText(test?.done)],
                  [TEST.tolerance.show, optionText(TOLERANCE_LABELS, test?.tolerance)],
                  [TEST.movement.show, optionText(MOVEMENT_LABELS, test?.movement)],
                  [TEST.skinAfter.show, optionText(SKIN_AFTER_LABELS, test?.skinAfter)],
                ]
          }
        />
      </Section>
      <Section title="F. Outcome">
        <AnswerRows
          rows={[
            [OUT.result.show, optionText(OUTCOME_LABELS, outcome?.result)],
            [OUT.rescreenOn.show, date(outcome?.rescreenOn) ?? "No date set"],
            [OUT.notes.show, outcome?.notes ?? "None"],
          ]}
        />
      </Section>
    </div>
  );
}
