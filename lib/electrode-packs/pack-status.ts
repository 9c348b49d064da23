// Whether it is time for new electrodes: after the therapist's number of uses, or as soon as the client reports
// edges lifting or poor sticking (a lifting edge concentrates current; common practice, no published source).
export type PackStatus = {
  openedOn: string | null;
  uses: number;
  replaceAfterUses: number | null;
  replaceNow: boolean;
  reason: "uses" | "edges-lifting" | "poor-sticking" | "no-pack" | null;
};

export function packStatus(input: {
  openedOn: string | null;
  uses: number;
  replaceAfterUses: number | null;
  latestCondition: "fine" | "edges-lifting" | "poor-sticking" | null;
}): PackStatus {
  const base = { openedOn: input.openedOn, uses: input.uses, replaceAfterUses: input.replaceAfterUses };
  if (input.latestCondition === "edges-lifting" || input.latestCondition === "poor-sticking") {
    return { ...base, replaceNow: true, reason: input.latestCondition };
  }
  if (input.replaceAfterUses !== null && input.openedOn !== null && input.uses >= input.replaceAfterUses) {
    return { ...base, replaceNow: true, reason: "uses" };
  }
  return { ...base, replaceNow: false, reason: input.openedOn === null ? "no-pack" : null };
}
