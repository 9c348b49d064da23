import { escapeHtml } from "./html-text";

// Plain black on white with underlined links and a thick focus ring: the page is a tool, and must stay readable in
// screenshots and usable from the keyboard.
const STYLES = `
  :root { color-scheme: light; }
  body { margin: 0; font: 1.0625rem/1.5 system-ui, sans-serif; color: #111; background: #fff; }
  header, main { max-width: 72rem; margin: 0 auto; padding: 1rem 1.25rem; }
  header { border-bottom: 2px solid #111; display: flex; gap: 1.5rem; align-items: baseline; flex-wrap: wrap; }
  header p { margin: 0; }
  a { color: #0b3d91; text-decoration: underline; text-underline-offset: 0.15em; }
  a:visited { color: #5a2a82; }
  a:focus-visible, iframe:focus-visible { outline: 3px solid #111; outline-offset: 2px; }
  h1 { font-size: 1.5rem; margin: 0.5rem 0 1rem; overflow-wrap: anywhere; }
  h2 { font-size: 1.2rem; margin: 2rem 0 0.5rem; }
  table { border-collapse: collapse; width: 100%; }
  th, td { text-align: left; vertical-align: top; padding: 0.45rem 0.6rem; border: 1px solid #555; overflow-wrap: anywhere; }
  th { background: #eee; }
  iframe { width: 100%; height: 70vh; border: 2px solid #111; background: #fff; }
  pre { white-space: pre-wrap; overflow-wrap: anywhere; border: 1px solid #555; padding: 0.75rem; background: #f6f6f6; }
  .muted { color: #444; }
`;

export function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en-GB">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)} · Rampline test mailbox</title>
<style>${STYLES}</style>
</head>
<body>
<header>
<p><strong><a href="/">Rampline test mailbox</a></strong></p>
<p class="muted">Mail the app sent while running locally. Nothing shown here left this machine.</p>
</header>
<main>
${body}
</main>
</body>
</html>
`;
}

const TIME_FORMAT = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "long" });

export function timeElement(iso: string): string {
  const date = new Date(iso);
  const label = Number.isNaN(date.getTime()) ? iso : TIME_FORMAT.format(date);
  return `<time datetime="${escapeHtml(iso)}">${escapeHtml(label)}</time>`;
}

export function notFoundPage(what: string): string {
  return layout("Not found", `<h1>Not found</h1>\n<p>${escapeHtml(what)}</p>\n<p><a href="/">Back to the mailbox</a></p>`);
}
