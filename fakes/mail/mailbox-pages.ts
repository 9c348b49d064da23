import { escapeHtml, extractLinks, isSafeHref } from "./html-text";
import { layout, timeElement } from "./mailbox-layout";
import type { StoredMessage } from "./store-schema";

// No allow-scripts and no allow-same-origin: the message cannot run code or reach this page. The other tokens let a
// click on a link leave the frame, so an invitation or reset link opens the app as it would from a real inbox.
export const FRAME_SANDBOX = "allow-popups allow-popups-to-escape-sandbox allow-top-navigation-by-user-activation";

const messagePath = (id: string) => `/messages/${encodeURIComponent(id)}`;

export function mailboxPage(messages: StoredMessage[]): string {
  if (messages.length === 0) {
    return layout(
      "Inbox",
      `<h1>Inbox</h1>\n<p>No mail yet. Anything the app sends through the mail fake appears here; reload the page to check again.</p>`,
    );
  }
  const rows = messages
    .map(
      (message) => `<tr>
<td>${timeElement(message.createdAt)}</td>
<td>${escapeHtml(message.to.join(", "))}</td>
<td><a href="${escapeHtml(messagePath(message.id))}">${escapeHtml(message.subject)}</a></td>
</tr>`,
    )
    .join("\n");
  const count = messages.length === 1 ? "1 message" : `${messages.length} messages`;
  return layout(
    "Inbox",
    `<h1>Inbox</h1>
<p>${count}, newest first. <a href="/">Reload</a></p>
<table>
<thead><tr><th scope="col">Received</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>`,
  );
}

function detailRows(message: StoredMessage): string {
  const rows: [string, string][] = [
    ["From", escapeHtml(message.from)],
    ["To", escapeHtml(message.to.join(", "))],
    ["Cc", escapeHtml(message.cc.join(", "))],
    ["Bcc", escapeHtml(message.bcc.join(", "))],
    ["Reply to", escapeHtml(message.replyTo.join(", "))],
    ["Received", timeElement(message.createdAt)],
    ["Scheduled for", message.scheduledAt ? escapeHtml(message.scheduledAt) : ""],
    ["Tags", escapeHtml(message.tags.map((tag) => `${tag.name}=${tag.value}`).join(", "))],
    ["Attachments", escapeHtml(message.attachments.map((file) => file.filename ?? "(unnamed)").join(", "))],
    ["Idempotency key", escapeHtml(message.idempotencyKey ?? "")],
    ...Object.entries(message.headers).map(([name, value]): [string, string] => [`Header ${escapeHtml(name)}`, escapeHtml(value)]),
    ["Message id", escapeHtml(message.id)],
  ];
  return rows
    .filter(([, value]) => value !== "")
    .map(([label, value]) => `<tr><th scope="row">${label}</th><td>${value}</td></tr>`)
    .join("\n");
}

function htmlPart(message: StoredMessage): string {
  if (!message.html) return "<p>This message has no HTML part.</p>";
  // The base element makes ordinary links target the whole tab instead of loading the app inside the frame.
  const document = `<base target="_top">${message.html}`;
  return `<iframe title="HTML part of the message" sandbox="${FRAME_SANDBOX}" referrerpolicy="no-referrer" srcdoc="${escapeHtml(document)}"></iframe>`;
}

function linkList(message: StoredMessage): string {
  const links = extractLinks(message.html, message.text);
  if (links.length === 0) return "<p>This message contains no links.</p>";
  const items = links.map((href) =>
    isSafeHref(href)
      ? `<li><a href="${escapeHtml(href)}">${escapeHtml(href)}</a></li>`
      : `<li><code>${escapeHtml(href)}</code> <span class="muted">(not made clickable: only web and mailto links are)</span></li>`,
  );
  return `<ul>\n${items.join("\n")}\n</ul>`;
}

export function messagePage(message: StoredMessage): string {
  const text = message.text ? `<pre>${escapeHtml(message.text)}</pre>` : "<p>This message has no plain-text part.</p>";
  return layout(
    message.subject,
    `<p><a href="/">Back to the inbox</a></p>
<h1>${escapeHtml(message.subject)}</h1>
<table>
${detailRows(message)}
</table>
<h2>HTML part</h2>
${htmlPart(message)}
<h2>Links in this message</h2>
${linkList(message)}
<h2>Plain-text part</h2>
${text}
<p><a href="/api/messages/${escapeHtml(encodeURIComponent(message.id))}">This message as JSON</a></p>`,
  );
}
