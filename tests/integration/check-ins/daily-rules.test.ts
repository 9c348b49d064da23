import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { flag, programme, programmeVersion } from "@/db/schema";
import { runDailyRules } from "@/lib/jobs/daily-rules-job";
import { clientWithProgramme } from "../../support/check-ins";

describe("the daily rules job", () => {
  it("flags a quiet client once, however often it runs", async () => {
    const { clientId } = await clientWithProgramme();
    // The programme was published ten days ago and nothing has been logged since.
    const [row] = await db().select().from(programme).where(eq(programme.clientId, clientId));
    await db().update(programmeVersion).set({ publishedAt: new Date(Date.now() - 10 * 24 * 60 * 60 * 1000) }).where(eq(programmeVersion.programmeId, row!.id));

    await runDailyRules();
    const first = await db().select().from(flag).where(eq(flag.clientId, clientId));
    expect(first.map((f) => f.rule).sort()).toEqual(["adherence-under-half-7-days", "no-check-in-4-days"]);

    await runDailyRules();
    expect(await db().select().from(flag).where(eq(flag.clientId, clientId))).toHaveLength(2);
  });
});
