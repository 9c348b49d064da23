import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { db } from "@/db/client";
import { carerLink, client, member, organization, user } from "@/db/schema";
import { demoCarers, demoClients, demoClinic, demoTherapists } from "@/db/seed/demo-clinic";
import { seedDemo } from "@/db/seed/seed-demo";

async function demoCounts() {
  const [members] = await db().select({ n: count() }).from(member).where(eq(member.organizationId, demoClinic.id));
  const [clients] = await db().select({ n: count() }).from(client).where(eq(client.organizationId, demoClinic.id));
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
});
