import { describe, expect, it } from "vitest";
import { POST } from "@/app/api/stim/analyse/route";
import type { ChannelAnalysis } from "@/lib/stim";
import { demoChannel, expectRelClose, round } from "../stim/helpers";

const URL = "http://rampline.test/api/stim/analyse";

function post(body: string, headers: Record<string, string> = { "content-type": "application/json" }) {
  return POST(new Request(URL, { method: "POST", headers, body }));
}
const postJson = (value: unknown) => post(JSON.stringify(value));

type ErrorJson = { error: { code: string; message: string; fields?: Record<string, string> } };

describe("POST /api/stim/analyse", () => {
  it("answers 200 with the derived figures for settings that parse", async () => {
    // The REFERENCES check-value row: symmetric biphasic 50 mA, 300 µs per phase, 35 Hz, 2 in round electrodes.
    const response = await postJson(
      demoChannel({ amplitudeCeilingMa: 50, phaseDurationUs: 300, frequencyHz: 35, electrodes: [round(2, "in"), round(2, "in")] }),
    );
    expect(response.status).toBe(200);
    expect(response.headers.get("cache-control")).toBe("no-store");
    const body = (await response.json()) as ChannelAnalysis;
    expect(body.ok).toBe(true);
    expect(body.fieldErrors).toEqual({});
    // source: REFERENCES.md check values, our own arithmetic from the formulas (I·sqrt(2·t·f))
    expectRelClose(body.derived?.current.rmsTrainMa, 7.246);
    // source: REFERENCES.md check values, our own arithmetic from the formulas (I_rms / A)
    expectRelClose(body.derived?.dose.currentDensityMaPerCm2, 0.3575);
    // source: REFERENCES.md check values, arithmetic (π(d/2)², 1 in = 2.54 cm)
    expectRelClose(body.derived?.electrodes.smallestAreaCm2, 20.268);
    // source: standard circuit arithmetic, period = 1/f = 1/35 s
    expectRelClose(body.derived?.pulse.periodUs, 1_000_000 / 35);
  });

  it("answers 200 for the monophasic check value too, with its net charge", async () => {
    const response = await postJson(demoChannel({ amplitudeCeilingMa: 50, waveform: { kind: "monophasic" } }));
    const body = (await response.json()) as ChannelAnalysis;
    // source: REFERENCES.md check values, our own arithmetic (I·sqrt(t·f))
    expectRelClose(body.derived?.current.rmsTrainMa, 5.123);
    // source: REFERENCES.md check values, our own arithmetic
    expectRelClose(body.derived?.dose.currentDensityMaPerCm2, 0.2528);
    // source: REFERENCES.md formulas, Q = I·t = 50 mA × 300 µs (one phase, so the net charge is that phase's)
    expectRelClose(body.derived?.pulse.netChargeUc, 15);
  });

  it("answers 200, not 400, when the settings parse but a finding blocks publishing", async () => {
    // 2 × 300 µs phases do not fit in the 500 µs period of 2,000 Hz. source: standard circuit arithmetic
    const response = await postJson(demoChannel({ frequencyHz: 2000, phaseDurationUs: 300 }));
    expect(response.status).toBe(200);
    const body = (await response.json()) as ChannelAnalysis;
    expect(body.ok).toBe(false);
    expect(body.findings[0]?.severity).toBe("blocks");
    expect(body.findings.map((f) => f.code)).toContain("pulses-overlap");
  });

  it("answers 400 with one message per bad field", async () => {
    const settings: Record<string, unknown> = { ...demoChannel({ frequencyHz: -5 }) };
    delete settings.holdS;
    settings.electrodes = [round(2, "in"), { shape: "round", diameter: "two", unit: "in" }];
    const response = await postJson(settings);
    expect(response.status).toBe(400);
    expect(response.headers.get("cache-control")).toBe("no-store");
    const body = (await response.json()) as ErrorJson;
    expect(body.error.code).toBe("VALIDATION");
    expect(body.error.message).toBeTruthy();
    const fields = body.error.fields ?? {};
    expect(Object.keys(fields).sort()).toEqual(["electrodes.1.diameter", "frequencyHz", "holdS"]);
    expect(fields.frequencyHz).toMatch(/frequency/i);
    expect(fields.holdS).toMatch(/hold/i);
    expect(fields["electrodes.1.diameter"]).toMatch(/diameter/i);
  });

  it("answers 400 when the body is JSON but not an object of settings", async () => {
    for (const value of [[], "35 Hz", null, 42]) {
      const response = await postJson(value);
      expect(response.status, JSON.stringify(value)).toBe(400);
      const body = (await response.json()) as ErrorJson;
      expect(body.error.code).toBe("VALIDATION");
      expect(Object.keys(body.error.fields ?? {}).length).toBeGreaterThan(0);
    }
  });

  it("answers 400 VALIDATION for an empty body", async () => {
    const response = await post("");
    expect(response.status).toBe(400);
    expect(((await response.json()) as ErrorJson).error.code).toBe("VALIDATION");
  });

  it("answers 400 BAD_REQUEST for malformed JSON", async () => {
    const response = await post('{"frequencyHz": 35,');
    expect(response.status).toBe(400);
    const body = (await response.json()) as ErrorJson;
    expect(body.error.code).toBe("BAD_REQUEST");
    expect(body.error.fields).toBeUndefined();
  });

  it("answers 415 when the body is not sent as JSON", async () => {
    const response = await post(JSON.stringify(demoChannel()), { "content-type": "text/plain" });
    expect(response.status).toBe(415);
    expect(((await response.json()) as ErrorJson).error.code).toBe("UNSUPPORTED_MEDIA_TYPE");
    expect((await post("{}", {})).status).toBe(415);
  });

  it("answers 413 for a body over the limit, declared or not", async () => {
    const big = JSON.stringify({ ...demoChannel(), padding: "x".repeat(20 * 1024) });
    const response = await post(big);
    expect(response.status).toBe(413);
    expect(((await response.json()) as ErrorJson).error.code).toBe("PAYLOAD_TOO_LARGE");
    // A stream with no Content-Length is cut off while it is read.
    const stream = new ReadableStream({
      start(controller) {
        controller.enqueue(new TextEncoder().encode(big));
        controller.close();
      },
    });
    const streamed = await POST(
      new Request(URL, { method: "POST", headers: { "content-type": "application/json" }, body: stream, duplex: "half" } as RequestInit),
    );
    expect(streamed.status).toBe(413);
  });

  it("accepts a body just under the limit", async () => {
    const padded = JSON.stringify({ ...demoChannel(), padding: "x".repeat(15 * 1024) });
    expect((await post(padded)).status).toBe(200);
  });
});
