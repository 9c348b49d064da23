// Everything that happened to a client's programme on one time axis, newest first, so "what changed, when, and what
// followed" reads straight down the page.
export type TimelineKind = "version" | "check-in" | "flag" | "flag-resolved" | "message" | "confirmation";
export type TimelineEntry = { at: Date; kind: TimelineKind; title: string; detail?: string; href?: string };

export type TimelineSources = {
  versions: { id: string; number: number; publishedAt: Date; reason: string; authorName: string; promptedByType: string | null; promptedById: string | null }[];
  checkIns: { id: string; createdAt: Date; sessionDate: string; minutes: number; comfort: number; worstSkin: number; loggedBy: string }[];
  flags: { id: string; createdAt: Date; title: string; severity: string; resolvedAt: Date | null; resolutionNote: string | null; checkInId: string | null }[];
  messages: { id: string; createdAt: Date; kind: "message" | "system"; authorName: string | null; body: string }[];
  confirmations: { at: Date; name: string; versionNumber: number }[];
};

const TIE_ORDER: Record<TimelineKind, number> = { confirmation: 0, "flag-resolved": 1, version: 2, message: 3, flag: 4, "check-in": 5 };

const shorten = (text: string, max = 140) => (text.length > max ? `${text.slice(0, max - 1)}…` : text);

export function buildTimeline(clientId: string, sources: TimelineSources): TimelineEntry[] {
  const entries: TimelineEntry[] = [];
  for (const v of sources.versions) {
    entries.push({
      at: v.publishedAt,
      kind: "version",
      title: `Version ${v.number} published by ${v.authorName}`,
      detail: `${v.reason}${v.promptedByType === "check-in" ? " (in reply to a session log)" : v.promptedByType ? ` (in reply to a ${v.promptedByType})` : ""}`,
      href: `/clients/${clientId}/programme/versions?from=${Math.max(v.number - 1, 1)}&to=${v.number}`,
    });
  }
  for (const c of sources.checkIns) {
    entries.push({ at: c.createdAt, kind: "check-in", title: `Session logged by ${c.loggedBy}`, detail: `${c.sessionDate}: ${c.minutes} min, comfort ${c.comfort}/10, worst skin level ${c.worstSkin}`, href: `/clients/${clientId}/check-ins/${c.id}` });
  }
  for (const f of sources.flags) {
    entries.push({ at: f.createdAt, kind: "flag", title: `${f.severity === "urgent" ? "Urgent flag" : "Flag"}: ${f.title}`, href: f.checkInId ? `/clients/${clientId}/check-ins/${f.checkInId}` : undefined });
    if (f.resolvedAt) entries.push({ at: f.resolvedAt, kind: "flag-resolved", title: `Flag resolved: ${f.title}`, detail: f.resolutionNote ?? undefined });
  }
  for (const m of sources.messages) {
    if (m.kind === "system") continue; // published versions and confirmations have their own entries
    entries.push({ at: m.createdAt, kind: "message", title: `Message from ${m.authorName ?? "someone who has left"}`, detail: shorten(m.body), href: `/clients/${clientId}/messages` });
  }
  for (const c of sources.confirmations) {
    entries.push({ at: c.at, kind: "confirmation", title: `${c.name} confirmed the stimulator matches version ${c.versionNumber}` });
  }
  // A flag is written in the same transaction as the log that raised it, so their times are equal: the one that
  // follows from the other comes first in a newest-first list.
  return entries.sort((a, b) => b.at.getTime() - a.at.getTime() || TIE_ORDER[a.kind] - TIE_ORDER[b.kind]);
}
