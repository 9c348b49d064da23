import { Notice } from "@/components/ui/notice";

// Shown for the whole of step 2: what to do if it hurts, and what this timer is and is not.
export function StopIfItHurts({ your }: { your: string }) {
  return (
    <Notice tone="blocks" word="Stop" title={`Stop and check ${your} skin if it hurts or burns`}>
      Turn the stimulator off, take the electrodes off and look at the skin. If there is a blister, broken skin or a
      burn mark, do not use that place again until you have spoken to the clinic.
    </Notice>
  );
}

export function FollowsAlong({ your }: { your: string }) {
  return (
    <p className="text-base text-ink-soft">
      Rampline does not control {your} stimulator. This timer only follows along while
      the stimulator runs its own programme. If the two drift apart, go by the stimulator and its instructions.
    </p>
  );
}
