import { MAIL_URL } from "./env";

export type FakeMessage = { id: string; to: string[]; subject: string; html: string; text?: string; links: string[]; createdAt: string };

export async function messagesTo(address: string): Promise<FakeMessage[]> {
  const response = await fetch(`${MAIL_URL}/api/messages?to=${encodeURIComponent(address)}`);
  if (!response.ok) throw new Error(`The mail fake answered ${response.status}`);
  return ((await response.json()) as { messages: FakeMessage[] }).messages;
}

// Mail goes through the job queue, so it arrives a moment after the request that caused it.
export async function waitForMessage(address: string, matching: (message: FakeMessage) => boolean = () => true, timeoutMs = 20_000) {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    const found = (await messagesTo(address)).find(matching);
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`No e-mail reached ${address} within ${timeoutMs} ms`);
}

export function mailboxUrl(): string {
  return MAIL_URL;
}
