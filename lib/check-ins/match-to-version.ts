import { AppError } from "@/lib/errors";
import type { ProgrammeContent } from "@/lib/programmes/content";
import type { CheckInFacts } from "@/lib/rules/check-in-rules";
import type { SkinLevel } from "./skin-scale";
import type { CheckInData } from "./schema";

// The check-in must describe exactly the channels and electrodes of the version it is measured against: one
// strength per channel and one skin check per electrode. Anything else is refused rather than half-saved.
export function matchToVersion(data: CheckInData, content: ProgrammeContent): Omit<CheckInFacts, "comfort" | "previousComfort"> {
  const fields: Record<string, string> = {};
  const ids = content.channels.map((channel) => channel.id);
  const given = data.channels.map((channel) => channel.channelId);
  if (given.length !== ids.length || !ids.every((id) => given.includes(id))) {
    fields.channels = "Enter the strength for each channel of your programme.";
  }
  for (const id of ids) {
    for (const electrode of ["A", "B"] as const) {
      const count = data.skin.filter((site) => site.channelId === id && site.electrode === electrode).length;
      if (count !== 1) fields.skin = "Check the skin under each electrode.";
    }
  }
  if (data.skin.length !== ids.length * 2) fields.skin = "Check the skin under each electrode.";
  if (Object.keys(fields).length > 0) throw new AppError("VALIDATION", "Some fields need attention.", fields);
  const numberOf = (id: string) => ids.indexOf(id) + 1;
  return {
    channels: data.channels.map((channel) => ({
      channelId: channel.channelId,
      number: numberOf(channel.channelId),
      amplitudeMa: channel.amplitudeMa,
      ceilingMa: content.channels.find((c) => c.id === channel.channelId)?.settings.amplitudeCeilingMa ?? null,
    })),
    skin: data.skin.map((site) => ({ ...site, channelNumber: numberOf(site.channelId), level: site.level as SkinLevel })),
  };
}
