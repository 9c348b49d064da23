import { describe, expect, it } from "vitest";
import { sampleEmail, useMailFake } from "./mail-fake-harness";

const HOSTILE_SUBJECT = `Invite "><script>alert(1)</script><img src=x onerror=alert(2)>`;

// Written out here rather than imported so the page is checked against the HTML rules, not against the fake's own code.
function unescapeAttribute(value: string): string {
  return value
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, "&");
}

async function page(url: string): Promise<{ status: number; html: string; headers: Headers }> {
  const res = await fetch(url);
  return { status: res.status, html: await res.text(), headers: res.headers };
}

describe("the mailbox pages", () => {
  const ctx = useMailFake();

  it("says what to do when the mailbox is empty", async () => {
    const { status, html } = await page(`${ctx.fake.url}/`);

    expect(status).toBe(200);
    expect(html).toContain("No mail yet.");
  });

  it("lists messages newest first with a link to each", async () => {
    const older = await ctx.resend.emails.send(sampleEmail({ subject: "Older" }));
    await ctx.resend.emails.send(sampleEmail({ subject: "Newer", to: "bo@example.com" }));
    const { html, headers } = await page(`${ctx.fake.url}/`);

    expect(headers.get("content-type")).toBe("text/html; charset=utf-8");
    expect(html).toContain("2 messages, newest first.");
    expect(html.indexOf(">Newer</a>")).toBeGreaterThan(-1);
    expect(html.indexOf(">Newer</a>")).toBeLessThan(html.indexOf(">Older</a>"));
    expect(html).toContain(`<a href="/messages/${older.data?.id ?? ""}">Older</a>`);
    expect(html).toContain("<td>bo@example.com</td>");
  });

  it("escapes an HTML-injection attempt in the subject on both pages", async () => {
    const { data } = await ctx.resend.emails.send(sampleEmail({ subject: HOSTILE_SUBJECT }));
    const escaped = "Invite &quot;&gt;&lt;script&gt;alert(1)&lt;/script&gt;&lt;img src=x onerror=alert(2)&gt;";

    for (const path of ["/", `/messages/${data?.id ?? ""}`]) {
      const { html } = await page(`${ctx.fake.url}${path}`);
      expect(html).not.toContain("<script>alert(1)");
      expect(html).not.toContain("<img src=x");
      expect(html).toContain(escaped);
    }
  });

  it("shows the headers, the sandboxed HTML part, clickable links and the plain text", async () => {
    const { data } = await ctx.resend.emails.send({ ...sampleEmail(), tags: [{ name: "kind", value: "invite" }] });
    const { status, html } = await page(`${ctx.fake.url}/messages/${data?.id ?? ""}`);

    expect(status).toBe(200);
    expect(html).toContain("<h1>Your Rampline invitation</h1>");
    expect(html).toContain("Rampline &lt;no-reply@rampline.test&gt;");
    expect(html).toContain("kind=invite");
    expect(html).toContain(
      'sandbox="allow-popups allow-popups-to-escape-sandbox allow-top-navigation-by-user-activation"',
    );
    expect(html).not.toMatch(/sandbox="[^"]*allow-(scripts|same-origin)/);

    const srcdoc = /srcdoc="([^"]*)"/.exec(html)?.[1];
    expect(unescapeAttribute(srcdoc ?? "")).toBe(`<base target="_top">${sampleEmail().html}`);

    expect(html).toContain(
      '<a href="http://127.0.0.1:3000/invite?token=abc&amp;clinic=7">http://127.0.0.1:3000/invite?token=abc&amp;clinic=7</a>',
    );
    expect(html).toContain("<pre>Hello. Accept the invitation: http://127.0.0.1:3000/invite?token=abc&amp;clinic=7</pre>");
  });

  it("does not turn javascript: links into anchors", async () => {
    const { data } = await ctx.resend.emails.send(
      sampleEmail({ html: `<a href="javascript:alert(document.domain)">Click</a>`, text: undefined }),
    );
    const { html } = await page(`${ctx.fake.url}/messages/${data?.id ?? ""}`);

    expect(html).not.toContain('href="javascript:');
    expect(html).toContain("<code>javascript:alert(document.domain)</code>");
    expect(html).toContain("This message has no plain-text part.");
  });

  it("sends a policy that forbids scripts on the page and inside the frame", async () => {
    const { headers } = await page(`${ctx.fake.url}/`);
    const policy = headers.get("content-security-policy") ?? "";

    expect(policy).toContain("default-src 'none'");
    expect(policy).not.toContain("script-src");
  });

  it("answers 404 with a page for an unknown message", async () => {
    const { status, html } = await page(`${ctx.fake.url}/messages/00000000-0000-4000-8000-000000000000`);

    expect(status).toBe(404);
    expect(html).toContain("No message with that id is in the mailbox.");
  });
});
