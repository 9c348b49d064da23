import { and, count, eq, like } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { carerLink, client, member, organization, user } from "@/db/schema";
import { demoCarers, demoClients, demoClinic, demoTherapists } from "@/db/seed/demo-clinic";
import { seedDemo } from "@/db/seed/seed-demo";
import { seedDemoProgrammes } from "@/db/seed/seed-programmes";
import { programmeVersion, screening } from "@/db/schema";

async function demoCounts() {
  // Only the seed's own rows: browser tests add people to the demo clinic when they share this database.
  const [members] = await db().select({ n: count() }).from(member).where(and(eq(member.organizationId, demoClinic.id), like(member.id, "demo-member-%")));
  const [clients] = await db().select({ n: count() }).from(client).where(and(eq(client.organizationId, demoClinic.id), like(client.id, "demo-client-%")));
  const [links] = await db().select({ n: count() }).from(carerLink);
  const [users] = await db().select({ n: count() }).from(user);
  const [clinics] = await db().select({ n: count() }).from(organization).where(eq(organization.slug, demoClinic.slug));
  return { members: members!.n, clients: clients!.n, links: links!.n, users: users!.n, clinics: clinics!.n };
}

describe("the demo seed", () => {
  it("holds one clinic with an admin, two therapists, four clients and two carers", async () => {
    await seedDemo(db());
    const counts = await demoCounts();
    expect(counts.clinics).toBe(1);
    expect(counts.members).toBe(1 + demoTherapists.length + demoClients.length + demoCarers.length);
    expect(counts.clients).toBe(4);
    expect(demoTherapists).toHaveLength(2);
    expect(demoCarers).toHaveLength(2);
  });

  it("adds nothing and changes nothing when run again", async () => {
    await seedDemo(db());
    const before = await demoCounts();
    const [arthurBefore] = await db().select().from(client).where(eq(client.id, "demo-client-arthur"));
    const again = await seedDemo(db());
    expect(again.created).toBe(0);
    expect(await demoCounts()).toEqual(before);
    const [arthurAfter] = await db().select().from(client).where(eq(client.id, "demo-client-arthur"));
    expect(arthurAfter!.updatedAt).toEqual(arthurBefore!.updatedAt);
  });

  it("adds no second screening or programme version when run again", async () => {
    await seedDemoProgrammes(db());
    const [versionsBefore] = await db().select({ n: count() }).from(programmeVersion);
    const [screeningsBefore] = await db().select({ n: count() }).from(screening);
    expect(await seedDemoProgrammes(db())).toBe(0);
    expect((await db().select({ n: count() }).from(programmeVersion))[0]).toEqual(versionsBefore);
    expect((await db().select({ n: count() }).from(screening))[0]).toEqual(screeningsBefore);
  });
});
