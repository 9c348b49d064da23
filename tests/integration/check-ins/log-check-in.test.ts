import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db, pool } from "@/db/client";
import { checkIn, flag } from "@/db/schema";
import { logCheckIn } from "@/lib/check-ins/log-check-in";
import { AppError } from "@/lib/errors";
import { checkInInput, clientWithProgramme } from "../../support/check-ins";
import { createClinic, createPerson } from "../../support/factories";

async function refusal(promise: Promise<unknown>) {
  const error = await promise.then(() => null, (caught: unknown) => caught);
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

const checkInsOf = (clientId: string) => db().select().from(checkIn).where(eq(checkIn.clientId, clientId));
const flagsOf = (clientId: string) => db().select().from(flag).where(eq(flag.clientId, clientId));

async function flagMailsTo(address: string) {
  const { rows } = await pool().query("SELECT data FROM pgboss.job WHERE name = 'email' AND data->>'to' = $1 AND data->>'template' = 'flag-raised'", [address]);
  return rows as { data: { data: { urgent: boolean } } }[];
}

describe("logging a session", () => {
  it("saves an unremarkable session against the version in force, with no flag and no e-mail", async () => {
    const { client, therapist, clientId } = await clientWithProgramme();
    const result = await logCheckIn(client, clientId, checkInInput());
    expect(result.flags).toEqual([]);
    expect(result.stopMessage).toBeNull();
    const [row] = await checkInsOf(clientId);
    expect(row).toMatchObject({ loggedById: client.userId, loggedByRole: "client", minutes: 30, comfort: 7 });
    expect(row!.programmeVersionId).not.toBeNull();
    expect(await flagMailsTo(therapist.email)).toHaveLength(0);
  });

  it("records a carer's entry as the carer's", async () => {
    const { carer, clientId } = await clientWithProgramme();
    await logCheckIn(carer, clientId, checkInInput());
    const [row] = await checkInsOf(clientId);
    expect(row).toMatchObject({ loggedById: carer.userId, loggedByRole: "carer" });
  });

  it("raises a review flag for lasting redness and e-mails the therapist", async () => {
    const { client, therapist, clientId } = await clientWithProgramme();
    const result = await logCheckIn(client, clientId, checkInInput({}, 3));
    expect(result.flags.map((f) => [f.rule, f.severity])).toEqual([["skin-level-3-or-above", "review"]]);
    expect(result.stopMessage).toBeNull();
    const mails = await flagMailsTo(therapist.email);
    expect(mails.map((m) => m.data.data.urgent)).toEqual([false]);
  });

  it("makes blisters urgent: the client is told to stop at once and the therapist is e-mailed as urgent", async () => {
    const { client, therapist, clientId } = await clientWithProgramme();
    const result = await logCheckIn(client, clientId, checkInInput({}, 5));
    expect(result.flags.map((f) => f.severity)).toEqual(["urgent"]);
    expect(result.stopMessage).toMatch(/^Stop using the stimulator on that site now, and contact your clinic/);
    expect(result.stopMessage).toMatch(/urgent medical care/);
    expect((await flagMailsTo(therapist.email)).map((m) => m.data.data.urgent)).toEqual([true]);
  });

  it("flags a strength above the ceiling and comfort of 3 or less twice running", async () => {
    const { client, clientId } = await clientWithProgramme();
    // The built-in starting point's ceiling is 30 mA.
    const first = await logCheckIn(client, clientId, checkInInput({ comfort: 3, channels: [{ channelId: "ch-1", amplitudeMa: 34 }] }));
    expect(first.flags.map((f) => f.rule)).toEqual(["amplitude-above-ceiling"]);
    const second = await logCheckIn(client, clientId, checkInInput({ comfort: 2 }));
    expect(second.flags.map((f) => f.rule)).toEqual(["comfort-3-or-less-twice"]);
  });

  it("refuses input that does not match the programme, and saves nothing", async () => {
    const { client, clientId } = await clientWithProgramme();
    const missingSite = checkInInput();
    missingSite.skin = missingSite.skin.slice(0, 1).concat([{ ...missingSite.skin[0]! }]);
    expect((await refusal(logCheckIn(client, clientId, missingSite))).fields?.skin).toMatch(/each electrode/);
    const wrongChannel = checkInInput({ channels: [{ channelId: "ch-9", amplitudeMa: 10 }] });
    expect((await refusal(logCheckIn(client, clientId, wrongChannel))).fields?.channels).toMatch(/each channel/);
    const badComfort = checkInInput({ comfort: 11 });
    expect((await refusal(logCheckIn(client, clientId, badComfort))).fields?.comfort).toMatch(/0 to 10/);
    const strangerPhoto = checkInInput({}, 3);
    strangerPhoto.skin[1]!.photoIds = ["not-a-photo"];
    expect((await refusal(logCheckIn(client, clientId, strangerPhoto))).fields?.skin).toMatch(/photo/);
    expect(await checkInsOf(clientId)).toHaveLength(0);
    expect(await flagsOf(clientId)).toHaveLength(0);
  });

  it("is for the client and their carers only", async () => {
    const { therapist, clinic, clientId } = await clientWithProgramme();
    const otherClient = await createPerson(clinic, "client");
    const outsider = await createPerson(await createClinic("Other"), "client");
    expect((await refusal(logCheckIn(therapist, clientId, checkInInput()))).code).toBe("FORBIDDEN");
    expect((await refusal(logCheckIn(otherClient, clientId, checkInInput()))).code).toBe("NOT_FOUND");
    expect((await refusal(logCheckIn(outsider, clientId, checkInInput()))).code).toBe("NOT_FOUND");
  });

  it("asks for a programme first when none is published", async () => {
    const clinic = await createClinic();
    const client = await createPerson(clinic, "client");
    expect((await refusal(logCheckIn(client, client.clientId!, checkInInput()))).code).toBe("BLOCKED");
  });
});
