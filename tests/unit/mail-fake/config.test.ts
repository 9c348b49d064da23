import { describe, expect, it } from "vitest";
import { readMailFakeConfig } from "@/fakes/mail/config";

describe("readMailFakeConfig", () => {
  it("uses the loopback defaults when only the key is given", () => {
    const result = readMailFakeConfig({ MAIL_FAKE_API_KEY: "re_local" }, "/srv/rampline");

    expect(result).toEqual({
      ok: true,
      config: { port: 3025, host: "127.0.0.1", apiKey: "re_local", storePath: "/srv/rampline/.data/mail-fake.json" },
      warnings: [],
    });
  });

  it("treats empty assignments as unset", () => {
    const result = readMailFakeConfig({ MAIL_FAKE_API_KEY: "k", MAIL_FAKE_PORT: "", MAIL_FAKE_HOST: " ", MAIL_FAKE_STORE: "" }, "/x");

    expect(result.ok && result.config).toMatchObject({ port: 3025, host: "127.0.0.1", storePath: "/x/.data/mail-fake.json" });
  });

  it("reads every variable, resolving a relative store path against the working directory", () => {
    const result = readMailFakeConfig(
      { MAIL_FAKE_API_KEY: "k", MAIL_FAKE_PORT: "4100", MAIL_FAKE_HOST: "localhost", MAIL_FAKE_STORE: "tmp/mail.json" },
      "/srv/app",
    );

    expect(result.ok && result.config).toEqual({ port: 4100, host: "localhost", apiKey: "k", storePath: "/srv/app/tmp/mail.json" });
  });

  it("requires the API key", () => {
    const result = readMailFakeConfig({});

    expect(result.ok).toBe(false);
    expect(!result.ok && result.errors.join(" ")).toContain("MAIL_FAKE_API_KEY is required");
  });

  it.each(["abc", "0", "65536", "30.5", "-1"])("rejects the port %j", (port) => {
    const result = readMailFakeConfig({ MAIL_FAKE_API_KEY: "k", MAIL_FAKE_PORT: port });

    expect(!result.ok && result.errors).toEqual([`MAIL_FAKE_PORT must be a whole number from 1 to 65535 (got "${port}").`]);
  });

  it("reports every problem at once", () => {
    const result = readMailFakeConfig({ MAIL_FAKE_PORT: "x", MAIL_FAKE_HOST: "http://127.0.0.1" });

    expect(!result.ok && result.errors).toHaveLength(3);
  });

  it("warns, without refusing, when asked to listen beyond loopback", () => {
    const result = readMailFakeConfig({ MAIL_FAKE_API_KEY: "k", MAIL_FAKE_HOST: "0.0.0.0" });

    expect(result.ok).toBe(true);
    expect(result.ok && result.warnings[0]).toContain("not a loopback address");
  });
});
