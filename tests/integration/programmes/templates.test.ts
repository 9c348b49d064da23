import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { programmeTemplate } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { saveProgrammeTemplate } from "@/lib/programmes/save-template";
import { createClinic, createPerson } from "../../support/factories";
import { publishableValues } from "../../support/programmes";

describe("clinic templates", () => {
  it("keep a programme's channels for the clinic, without one client's marks and photos", async () => {
    const clinic = await createClinic("Template clinic");
    const therapist = await createPerson(clinic, "therapist");
    const values = publishableValues();
    values.channels[0]!.photoIds = ["a-client-photo"];
    const { templateId } = await saveProgrammeTemplate(therapist, { name: "Our wrist extension", channels: values.channels });
    const [row] = await db().select().from(programmeTemplate).where(eq(programmeTemplate.id, templateId));
    expect(row!.organizationId).toBe(clinic.organizationId);
    const channel = (row!.content as { channels: Record<string, unknown>[] }).channels[0]!;
    expect(channel).toMatchObject({ target: values.channels[0]!.target, markers: [null, null], photoIds: [] });
    expect(channel).not.toHaveProperty("id");
  });

  it("are saved by therapists only, with a name", async () => {
    const clinic = await createClinic("Template clinic");
    const admin = await createPerson(clinic, "admin");
    const therapist = await createPerson(clinic, "therapist");
    const forbidden = await saveProgrammeTemplate(admin, { name: "Nope", channels: publishableValues().channels }).catch((e: unknown) => e);
    expect((forbidden as AppError).code).toBe("FORBIDDEN");
    const unnamed = await saveProgrammeTemplate(therapist, { name: "", channels: publishableValues().channels }).catch((e: unknown) => e);
    expect((unnamed as AppError).fields?.name).toMatch(/at least 3/);
  });
});
