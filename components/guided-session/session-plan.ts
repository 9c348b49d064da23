import type { ProgrammeContent } from "@/lib/programmes/content";
import type { CycleSettings } from "@/lib/stim";

// What the guided session needs from a published version, as plain data the server page hands to the client
// component (nothing else of the version goes to the browser).

export type SessionChannel = { id: string; label: string; cycle: CycleSettings };

export type SessionPlan = {
  versionId: string;
  versionNumber: number;
  minutesPerSession: number;
  channels: SessionChannel[];
  skinPreparation: string[];
  electrodeCare: string[];
  ownCautions: string[];
};

export type ChecklistItem = { id: string; text: string; link?: { href: string; text: string } };

export function sessionPlanFromVersion(version: { id: string; number: number; content: ProgrammeContent }): SessionPlan {
  const { content } = version;
  return {
    versionId: version.id,
    versionNumber: version.number,
    minutesPerSession: content.schedule.minutesPerSession,
    channels: content.channels.map((channel, index) => {
      const { rampUpS, holdS, rampDownS, restS } = channel.settings;
      return { id: channel.id, label: `Channel ${index + 1}: ${channel.target}`, cycle: { rampUpS, holdS, rampDownS, restS } };
    }),
    skinPreparation: content.skinPreparation,
    electrodeCare: content.electrodeCare,
    ownCautions: content.ownCautions,
  };
}

/** Step 1's list: the version's skin preparation, then the placement and the stimulator's settings. */
export function beforeChecklist(plan: SessionPlan): ChecklistItem[] {
  return [
    ...plan.skinPreparation.map((text, index) => ({ id: `prep-${index}`, text })),
    { id: "placed", text: "Electrodes placed as in the photo and drawing, and smoothed flat" },
    {
      id: "settings",
      text: `The stimulator is set to version ${plan.versionNumber} of the programme`,
      link: { href: "/programme", text: `See the settings of version ${plan.versionNumber}` },
    },
  ];
}

export function afterChecklist(plan: SessionPlan): ChecklistItem[] {
  return plan.electrodeCare.map((text, index) => ({ id: `care-${index}`, text }));
}

/** Whose session it is, in the words each screen uses: the client's own, or a carer's on the client's behalf. */
export type SessionWords = { title: string; your: string; Your: string };

export function sessionWords(carerForFirstName: string | null): SessionWords {
  if (!carerForFirstName) return { title: "Your session", your: "your", Your: "Your" };
  const whose = `${carerForFirstName}'s`;
  return { title: `${whose} session`, your: whose, Your: whose };
}
