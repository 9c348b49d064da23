import type { RaisedFlag } from "@/lib/rules/check-in-rules";
import { RULES } from "@/lib/rules/check-in-rules";

// Shown to the client the moment an urgent skin report is saved, before anyone at the clinic has seen it.
export function stopMessageFor(flags: RaisedFlag[]): string | null {
  if (!flags.some((flag) => flag.rule === RULES.skinUrgent)) return null;
  return "Stop using the stimulator on that site now, and contact your clinic today. Do not put an electrode on blistered, broken or burnt skin. If it looks like a burn, or it is getting worse, get urgent medical care today.";
}
