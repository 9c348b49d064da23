import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { auditEvent, carerLink, client, invitation, member } from "@/db/schema";
import { AppError } from "@/lib/errors";
import { acceptInvitation } from "@/lib/invitations/accept";
import { inviteCarer } from "@/lib/invitations/invite-carer";
import { inviteClient } from "@/lib/invitations/invite-client";
import { inviteTherapist } from "@/lib/invitations/invite-therapist";
import { signIn } from "../support/auth-requests";
import { createClinic, createPerson, uniqueSuffix } from "../support/factories";

async function expectAppError(promise: Promise<unknown>, code: AppError["code"]) {
  const error = await promise.then(() => null, (caught: unknown) => caught);
  expect(error).toBeInstanceOf(AppError);
  expect((error as AppError).code).toBe(code);
  return error as AppError;
}

const newEmail = (who: string) => `${who}-${uniqueSuffix()}@test.example`;
const password = "a-long-enough-password";

describe("who may invite whom", () => {
  it("lets only an admin invite a therapist", async () => {
    const clinic = await createClinic();
    for (const role of ["therapist", "client"] as const) {
      const actor = await createPerson(clinic, role);
      await expectAppError(inviteTherapist(actor, { name: "New Person", email: newEmail("x") }), "FORBIDDEN");
    }
    const admin = await createPerson(clinic, "admin");
    const result = await inviteTherapist(admin, { name: "New Therapist", email: newEmail("therapist") });
    expect(result.invitationId.length).toBeGreaterThanOrEqual(32);
  });

  it("lets only a therapist create and invite a client, who then belongs to that therapist", async () => {
    const clinic = await createClinic();
    const admin = await createPerson(clinic, "admin");
    await expectAppError(inviteClient(admin, { fullName: "Some Client", email: newEmail("c") }), "FORBIDDEN");
    const therapist = await createPerson(clinic, "therapist");
    const { clientId } = await inviteClient(therapist, { fullName: "Some Client", email: newEmail("c") });
    const [record] = await db().select().from(client).where(eq(client.id, clientId));
    expect(record).toMatchObject({ organizationId: clinic.organizationId, primaryTherapistId: therapist.userId, userId: null });
  });

  it("lets a client invite a carer for themselves only, with in-app consent", async () => {
    const clinic = await createClinic();
    const alice = await createPerson(clinic, "client");
    const bob = await createPerson(clinic, "client");
    const carer = { carerName: "Helping Hand", carerEmail: newEmail("carer"), relationship: "Son", consentConfirmed: true as const };
    await expectAppError(inviteCarer(alice, bob.clientId!, { ...carer, consentMethod: "in-app" }), "NOT_FOUND");
    await expectAppError(inviteCarer(alice, alice.clientId!, { ...carer, consentMethod: "verbal" }), "VALIDATION");
    const { carerLinkId } = await inviteCarer(alice, alice.clientId!, { ...carer, consentMethod: "in-app" });
    const [link] = await db().select().from(carerLink).where(eq(carerLink.id, carerLinkId));
    expect(link).toMatchObject({ clientId: alice.clientId, consentSource: "client", consentRecordedById: alice.userId });
  });

  it("lets a therapist invite a carer only for a client of their own clinic, recording how consent was given", async () => {
    const clinic = await createClinic();
    const other = await createClinic("Other clinic");
    const therapist = await createPerson(clinic, "therapist");
    const ownClient = await createPerson(clinic, "client");
    const foreignClient = await createPerson(other, "client");
    const carer = { carerName: "Helping Hand", carerEmail: newEmail("carer"), relationship: "Wife", consentConfirmed: true as const };
    await expectAppError(inviteCarer(therapist, foreignClient.clientId!, { ...carer, consentMethod: "verbal" }), "NOT_FOUND");
    await expectAppError(inviteCarer(therapist, ownClient.clientId!, { ...carer, consentMethod: "in-app" }), "VALIDATION");
    const { carerLinkId } = await inviteCarer(therapist, ownClient.clientId!, {
      ...carer,
      consentMethod: "written",
      consentNote: "Signed form, scanned to the record",
    });
    const [link] = await db().select().from(carerLink).where(eq(carerLink.id, carerLinkId));
    expect(link).toMatchObject({ consentSource: "recorded-by-therapist", consentMethod: "written", consentRecordedById: therapist.userId });
    const audit = await db().select().from(auditEvent).where(and(eq(auditEvent.entityId, carerLinkId), eq(auditEvent.action, "carer.consent-recorded")));
    expect(audit).toHaveLength(1);
  });

  it("refuses a carer without the consent box ticked, and saves nothing", async () => {
    const clinic = await createClinic();
    const alice = await createPerson(clinic, "client");
    const email = newEmail("carer");
    const error = await expectAppError(
      inviteCarer(alice, alice.clientId!, { carerName: "No Consent", carerEmail: email, relationship: "Friend", consentMethod: "in-app", consentConfirmed: false as unknown as true }),
      "VALIDATION",
    );
    expect(error.fields?.consentConfirmed).toMatch(/confirm consent/);
    expect(await db().select().from(invitation).where(eq(invitation.email, email))).toHaveLength(0);
  });
});

describe("accepting an invitation", () => {
  it("creates the account, the membership and the client link in one go, and the person can sign in", async () => {
    const clinic = await createClinic();
    const therapist = await createPerson(clinic, "therapist");
    const email = newEmail("client");
    const { clientId } = await inviteClient(therapist, { fullName: "Newly Invited", email });
    const [row] = await db().select().from(invitation).where(eq(invitation.email, email));
    const accepted = await acceptInvitation(row!.id, { name: "Newly Invited", password, confirmPassword: password });
    expect(accepted.role).toBe("client");
    const [record] = await db().select().from(client).where(eq(client.id, clientId));
    expect(record!.userId).toBe(accepted.userId);
    const memberships = await db().select().from(member).where(eq(member.userId, accepted.userId));
    expect(memberships).toMatchObject([{ organizationId: clinic.organizationId, role: "client" }]);
    expect((await signIn(email, password)).status).toBe(200);
  });

  it("cannot be used twice, after expiry, or when withdrawn", async () => {
    const clinic = await createClinic();
    const admin = await createPerson(clinic, "admin");
    const first = await inviteTherapist(admin, { name: "Twice Used", email: newEmail("t") });
    await acceptInvitation(first.invitationId, { name: "Twice Used", password, confirmPassword: password });
    const again = await expectAppError(acceptInvitation(first.invitationId, { name: "Again", password, confirmPassword: password }), "GONE");
    expect(again.message).toMatch(/already been used/);

    const late = await inviteTherapist(admin, { name: "Too Late", email: newEmail("t") });
    await db().update(invitation).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitation.id, late.invitationId));
    expect((await expectAppError(acceptInvitation(late.invitationId, { name: "Too Late", password, confirmPassword: password }), "GONE")).message).toMatch(/expired/);

    // Inviting the same address again withdraws the first, unused invitation.
    const email = newEmail("t");
    const original = await inviteTherapist(admin, { name: "Re Sent", email });
    await inviteTherapist(admin, { name: "Re Sent", email });
    expect((await expectAppError(acceptInvitation(original.invitationId, { name: "Re Sent", password, confirmPassword: password }), "GONE")).message).toMatch(/withdrawn/);
  });

  it("rejects a short password or a mismatch with field messages, leaving the invitation usable", async () => {
    const clinic = await createClinic();
    const admin = await createPerson(clinic, "admin");
    const { invitationId } = await inviteTherapist(admin, { name: "Careful Typist", email: newEmail("t") });
    const short = await expectAppError(acceptInvitation(invitationId, { name: "Careful Typist", password: "short", confirmPassword: "short" }), "VALIDATION");
    expect(short.fields?.password).toMatch(/at least 10/);
    const mismatch = await expectAppError(acceptInvitation(invitationId, { name: "Careful Typist", password, confirmPassword: `${password}x` }), "VALIDATION");
    expect(mismatch.fields?.confirmPassword).toMatch(/not the same/);
    const [row] = await db().select().from(invitation).where(eq(invitation.id, invitationId));
    expect(row!.status).toBe("pending");
  });

  it("refuses an address that already has an account", async () => {
    const clinic = await createClinic();
    const admin = await createPerson(clinic, "admin");
    const existing = await createPerson(clinic, "therapist");
    const error = await expectAppError(inviteTherapist(admin, { name: "Already Here", email: existing.email.toUpperCase() }), "CONFLICT");
    expect(error.fields?.email).toMatch(/already has a Rampline account/);
  });
});
