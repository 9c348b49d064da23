import { Notice } from "@/components/ui/notice";

// The cautions that matter at the moment of starting, in short, above the checklist. The full list is in the
// programme; the therapist's own cautions for this client are repeated here because they are about this client.
export function UsualCautions({ ownCautions, your }: { ownCautions: string[]; your: string }) {
  return (
    <Notice tone="warning" word="Before you switch on">
      <ul className="mt-2 flex list-disc flex-col gap-1 pl-6">
        <li>Start with the strength at zero and turn it up slowly.</li>
        <li>Stop at once if it hurts or burns, and check the skin.</li>
        <li>Never place electrodes over the front of the neck, across the chest, or over broken skin.</li>
        {ownCautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
      <p className="mt-2">
        Follow {your} therapist&apos;s advice and the stimulator&apos;s own instructions. If anything here disagrees with
        them, they come first.
      </p>
    </Notice>
  );
}
