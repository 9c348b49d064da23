import type { z } from "zod";
import { fieldPath } from "../parse";
import { SOURCES } from "./sources";
import type { Finding } from "./types";

function isOutOfRange(issue: z.core.$ZodIssue): boolean {
  if (issue.code === "too_small" || issue.code === "too_big" || issue.code === "custom") return true;
  // A number that is not whole (sessions per day, days per week) is a number out of its allowed set.
  return issue.code === "invalid_type" && issue.expected === "int";
}

/**
 * Schema failures as blocking findings, one per field: the live panel and the publish check then show
 * impossible input in the same list as every other finding.
 */
export function findingsFromIssues(issues: readonly z.core.$ZodIssue[]): Finding[] {
  const seen = new Set<string>();
  const out: Finding[] = [];
  for (const issue of issues) {
    const field = fieldPath(issue.path);
    if (seen.has(field)) continue;
    seen.add(field);
    const outOfRange = isOutOfRange(issue);
    out.push({
      code: outOfRange ? "value-out-of-range" : "value-invalid",
      severity: "blocks",
      title: outOfRange ? "A value is out of range" : "A value is missing or not valid",
      explanation: `${issue.message} The programme cannot be published until this is corrected.`,
      source: SOURCES.commonPractice,
      field,
    });
  }
  return out;
}
