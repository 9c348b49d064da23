import { afterAll, describe, expect, it, vi } from "vitest";
import { GET as handoutRoute } from "@/app/api/clients/[clientId]/programme/handout/route";
import { settingsRows } from "@/components/programme-view/plain-words";
import { zoneLabelForMarker } from "@/lib/programmes/zone-names";
import { params, sessionCookie } from "../../support/auth-requests";
import { createClinic, createPerson } from "../../support/factories";
import { sampleContent } from "../../unit/programmes/fixtures";
import { solidImage } from "../../unit/uploads/support/test-images";
import { removeStorageRoot } from "../uploads/support/upload-requests";
import { publishVersion, storePlacementPhoto } from "./support/publish-handout";
import { comparable, readPdf } from "./support/read-pdf";

// Its own storage root, so these photos never mix with another test file's.
vi.hoisted(() => {
  process.env.STORAGE_DIR = `${process.env.STORAGE_DIR ?? ".data/uploads-test"}/handout-${process.pid}-${Date.now()}`;
});
afterAll(removeStorageRoot);

const get = (clientId: string, cookie?: string) =>
  handoutRoute(
    new Request(`http://127.0.0.1:3000/api/clients/${clientId}/programme/handout`, { headers: cookie ? { cookie } : {} }),
    params({ clientId }),
  );

async function pdfOf(response: Response) {
  expect(response.status).toBe(200);
  const bytes = new Uint8Array(await response.arrayBuffer());
  return { bytes, pdf: await readPdf(bytes) };
}

describe("the handout as a PDF download", async () => {
  const clinic = await createClinic();
  const therapist = await createPerson(clinic, "therapist");
  const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
  const clientId = client.clientId!;
  const carer = await createPerson(clinic, "carer", { clientId });

  const photo = await storePlacementPhoto(client, therapist, await solidImage(120, 90));
  const content = sampleContent();
  content.channels[0]!.photoIds = [photo.id];
  content.channels[0]!.placementNote = "Electrode A two finger-widths below the elbow crease.";
  content.ownCautions = ["Check the skin under electrode B closely after each session."];
  await publishVersion(client, therapist, content);
  const channel = content.channels[0]!;

  const cookies = {
    therapist: await sessionCookie(therapist.email),
    client: await sessionCookie(client.email),
    carer: await sessionCookie(carer.email),
  };
  const fromTherapist = get(clientId, cookies.therapist).then(async (response) => ({ response, ...(await pdfOf(response.clone())) }));

  it("is a private PDF attachment whose file name carries the version, not the client's name", async () => {
    const { response, bytes } = await fromTherapist;
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(response.headers.get("content-disposition")).toBe('attachment; filename="rampline-handout-v1.pdf"');
    expect(response.headers.get("cache-control")).toBe("private, no-store");
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
    expect(response.headers.get("content-length")).toBe(String(bytes.length));
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).toBe("%PDF-");
  });

  it("prints who and what it is for, the schedule and every page's number", async () => {
    const { pdf } = await fromTherapist;
    expect(pdf.pageCount).toBeGreaterThanOrEqual(1);
    expect(pdf.offPageText).toEqual([]);
    expect(pdf.overlappingText).toEqual([]);
    expect(pdf.text).toContain(`${clinic.clinicName} · home stimulation programme`);
    expect(pdf.text).toContain(client.name);
    expect(pdf.text).toContain(`Version 1, from `);
    expect(pdf.text).toContain(`written by ${therapist.name}.`);
    expect(pdf.text).toContain("30 minutes, once a day, 5 days a week, for 6 weeks.");
    expect(pdf.text).toContain("Your therapist will review the programme with you on 15 January 2027.");
    pdf.pages.forEach((page, index) => expect(page).toContain(`Page ${index + 1} of ${pdf.pageCount}`));
  });

  it("prints the channel: where the electrodes go, the settings in plain words and the cycle in seconds", async () => {
    const { pdf } = await fromTherapist;
    expect(pdf.text).toContain("Channel 1: Wrist and finger extensors (left side)");
    expect(pdf.text).toContain(`Electrode A ${zoneLabelForMarker(channel.markers[0])}`);
    expect(pdf.text).toContain(`Electrode B ${zoneLabelForMarker(channel.markers[1])}`);
    expect(pdf.text).toContain(channel.placementNote);
    // The sample's settings are 35 Hz and 300 µs; the rows are what the app's programme view shows.
    expect(settingsRows(channel)).toEqual(
      expect.arrayContaining([
        ["Frequency", "35 Hz"],
        ["Pulse duration", "300 µs"],
      ]),
    );
    expect(pdf.text).toContain("Frequency 35 Hz");
    expect(pdf.text).toContain(comparable("Pulse duration 300 µs"));
    for (const [label, value] of settingsRows(channel)) expect(pdf.text).toContain(comparable(`${label} ${value}`));
    expect(pdf.text).toContain("One cycle: ramp-up 1 s, hold at full strength 5 s, ramp-down 1 s, rest 25 s; 32 s in all.");
  });

  it("numbers the steps and prints every caution, the standard ones first, and defers to clinician and manufacturer", async () => {
    const { pdf } = await fromTherapist;
    content.skinPreparation.forEach((step, index) => expect(pdf.text).toContain(`${index + 1}. ${step}`));
    content.electrodeCare.forEach((step, index) => expect(pdf.text).toContain(`${index + 1}. ${step}`));
    expect(content.standardCautions.length).toBeGreaterThan(0);
    for (const caution of [...content.standardCautions, ...content.ownCautions]) expect(pdf.text).toContain(`• ${caution}`);
    const statement = "This handout follows the advice of your treating clinician and your stimulator's instructions from its manufacturer.";
    expect(pdf.text).toContain(statement);
    expect(pdf.text).toContain("Rampline is not a medical device and makes no clinical decisions.");
    expect(pdf.text).toContain(`Contact ${clinic.clinicName}`);
    // The sections come in the HTML handout's order.
    const order = ["When", "Channel 1:", "Before each session: skin preparation", "After each session: electrode care", "Cautions", statement];
    const positions = order.map((heading) => pdf.text.indexOf(heading));
    expect(positions.every((position) => position >= 0)).toBe(true);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
  });

  it("embeds the placement photo from storage, at the size it was stored", async () => {
    const { pdf } = await fromTherapist;
    expect(pdf.images).toEqual([{ page: expect.any(Number), width: photo.width, height: photo.height }]);
    expect([photo.width, photo.height]).toEqual([120, 90]);
    expect(pdf.text).toContain("Channel 1, placement photo 1");
  });

  it("gives the client and their carer the same handout", async () => {
    for (const cookie of [cookies.client, cookies.carer]) {
      const { pdf } = await pdfOf(await get(clientId, cookie));
      expect(pdf.text).toContain(client.name);
      expect(pdf.images).toHaveLength(1);
    }
  });
});
