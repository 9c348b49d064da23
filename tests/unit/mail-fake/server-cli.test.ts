import { spawn, type ChildProcess } from "node:child_process";
import { mkdtemp, readFile, rm } from "node:fs/promises";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterEach, describe, expect, it } from "vitest";
import { inspectMessages, resendFor, sampleEmail, TEST_KEY } from "./mail-fake-harness";

// Run the entry point exactly as documented (through tsx), so the test covers config loading and signal handling.
const TSX = join(process.cwd(), "node_modules", ".bin", "tsx");
const SERVER = join(process.cwd(), "fakes", "mail", "server.ts");

interface Run {
  child: ChildProcess;
  output: () => string;
  exited: Promise<number | null>;
}

function run(env: Record<string, string>): Run {
  const clean = Object.fromEntries(Object.entries(process.env).filter(([name]) => !name.startsWith("MAIL_FAKE_")));
  const childEnv = { ...clean, ...env } as NodeJS.ProcessEnv;
  const child = spawn(TSX, [SERVER], { env: childEnv, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout?.on("data", (chunk: Buffer) => (output += chunk.toString()));
  child.stderr?.on("data", (chunk: Buffer) => (output += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.on("exit", (code) => resolve(code)));
  return { child, output: () => output, exited };
}

async function freePort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", resolve));
  const address = probe.address();
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  if (address === null || typeof address === "string") throw new Error("no port");
  return address.port;
}

async function waitFor(check: () => boolean, what: string): Promise<void> {
  for (let waited = 0; waited < 15_000; waited += 50) {
    if (check()) return;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`timed out waiting for ${what}`);
}

describe("npx tsx fakes/mail/server.ts", () => {
  const started: Run[] = [];
  let dir: string | undefined;

  afterEach(async () => {
    for (const entry of started.splice(0)) if (entry.child.exitCode === null) entry.child.kill("SIGKILL");
    if (dir) await rm(dir, { recursive: true, force: true });
  });

  it("exits with status 1 and names the missing variable", async () => {
    const cli = run({});
    started.push(cli);

    expect(await cli.exited).toBe(1);
    expect(cli.output()).toContain("MAIL_FAKE_API_KEY is required");
  }, 20_000);

  it.each(["SIGTERM", "SIGINT"] as const)("serves mail and stops cleanly on %s", async (signal) => {
    dir = await mkdtemp(join(tmpdir(), "rampline-mail-cli-"));
    const port = await freePort();
    const storePath = join(dir, "mail.json");
    const cli = run({ MAIL_FAKE_API_KEY: TEST_KEY, MAIL_FAKE_PORT: String(port), MAIL_FAKE_STORE: storePath });
    started.push(cli);
    await waitFor(() => cli.output().includes("listening"), "the listening line");

    const url = `http://127.0.0.1:${port}`;
    expect((await fetch(`${url}/health`)).status).toBe(200);
    expect((await resendFor(url).emails.send(sampleEmail())).error).toBeNull();
    expect(await inspectMessages(url)).toHaveLength(1);

    cli.child.kill(signal);
    expect(await cli.exited).toBe(0);
    expect(cli.output()).toContain(`${signal} received`);
    const saved = JSON.parse(await readFile(storePath, "utf8")) as { messages: unknown[] };
    expect(saved.messages).toHaveLength(1);
  }, 30_000);
});
