import type { CaseloadRow } from "@/db/queries/clients";

const DAY = 24 * 60 * 60 * 1000;

export function programmeStatus(row: CaseloadRow): { label: string; rank: number } {
  if (row.versionNumber) return { label: `Version ${row.versionNumber}${row.hasDraft ? ", draft changes" : ""}`, rank: 2 };
  if (row.hasDraft) return { label: "Draft, not published", rank: 1 };
  return { label: "None yet", rank: 0 };
}

export function screeningWords(outcome: string | null): string {
  if (outcome === "eligible") return "Eligible";
  if (outcome === "eligible-with-precautions") return "Eligible with precautions";
  if (outcome === "not-eligible") return "Not eligible";
  return "Not screened";
}

export function reviewStatus(reviewOn: string | null, now = Date.now()): "overdue" | "soon" | "later" | "none" {
  if (!reviewOn) return "none";
  const due = new Date(`${reviewOn}T23:59:59Z`).getTime();
  if (due < now) return "overdue";
  if (due - now < 7 * DAY) return "soon";
  return "later";
}

export const STATUS_FILTERS = {
  all: { label: "All clients", test: () => true },
  "needs-programme": { label: "No programme published", test: (row: CaseloadRow) => !row.versionNumber },
  published: { label: "Programme in force", test: (row: CaseloadRow) => Boolean(row.versionNumber) },
  "review-due": { label: "Review due this week or overdue", test: (row: CaseloadRow) => ["overdue", "soon"].includes(reviewStatus(row.reviewOn)) },
  "not-screened": { label: "Not screened yet", test: (row: CaseloadRow) => !row.screeningOutcome },
} satisfies Record<string, { label: string; test: (row: CaseloadRow) => boolean }>;
export type StatusFilter = keyof typeof STATUS_FILTERS;
