import { describe, expect, it } from "vitest";
import { listMessagesByClientId } from "@/db/queries/messages";
import { logCheckIn } from "@/lib/check-ins/log-check-in";
import { AppError } from "@/lib/errors";
import { postMessage } from "@/lib/messages/post-message";
import { readThread } from "@/lib/messages/read-thread";
import { checkInInput, clientWithProgramme } from "../../support/check-ins";
import { createClinic, createPerson } from "../../support/factories";

describe("the client's thread", () => {
  it("is shared by the client, carers and clinic staff, and a message can link to a log", async () => {
    const setup = await clientWithProgramme();
    const { checkInId } = await logCheckIn(setup.client, setup.clientId, checkInInput({}, 3));
    await postMessage(setup.therapist, setup.clientId, { body: "Thanks, I saw the photo.", about: { type: "check-in", id: checkInId } });
    const asCarer = await readThread(setup.carer, setup.clientId);
    const reply = asCarer.messages.find((m) => m.body === "Thanks, I saw the photo.");
    expect(reply).toMatchObject({ mine: false, about: { type: "check-in", id: checkInId } });
  });

  it("refuses people outside the circle and clinic, links to another client's records, and empty messages", async () => {
    const setup = await clientWithProgramme();
    const other = await clientWithProgramme();
    const { checkInId } = await logCheckIn(other.client, other.clientId, checkInInput());
    const outsider = await createPerson(await createClinic("Other"), "therapist");
    const otherClient = await createPerson(setup.clinic, "client");
    const code = async (p: Promise<unknown>) => ((await p.catch((e: unknown) => e)) as AppError).code;
    expect(await code(postMessage(outsider, setup.clientId, { body: "Hello" }))).toBe("NOT_FOUND");
    expect(await code(postMessage(otherClient, setup.clientId, { body: "Hello" }))).toBe("NOT_FOUND");
    expect(await code(readThread(outsider, setup.clientId))).toBe("NOT_FOUND");
    expect(await code(postMessage(setup.client, setup.clientId, { body: "Look", about: { type: "check-in", id: checkInId } }))).toBe("VALIDATION");
    expect(await code(postMessage(setup.client, setup.clientId, { body: "   " }))).toBe("VALIDATION");
    expect((await listMessagesByClientId(setup.clientId)).filter((row) => row.message.kind === "message")).toHaveLength(0);
  });
});
