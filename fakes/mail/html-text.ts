const ESCAPES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/** Safe for element content and for quoted attribute values alike. */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (char) => ESCAPES[char] ?? char);
}

const NAMED: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'", nbsp: "\u00a0" };

// Renderers write `&` in attribute values as `&amp;`; tests need the URL a browser would follow, not the markup.
export function decodeEntities(value: string): string {
  return value.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (whole, body: string) => {
    if (body[0] === "#") {
      const code = body[1] === "x" || body[1] === "X" ? parseInt(body.slice(2), 16) : parseInt(body.slice(1), 10);
      return code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : whole;
    }
    return NAMED[body.toLowerCase()] ?? whole;
  });
}

const ANCHOR_HREF = /<a\s(?:[^>]*?\s)?href\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'=<>`]+))/gi;
const TEXT_URL = /https?:\/\/[^\s<>"'()[\]]+/g;

/**
 * The hrefs of the message's anchors in document order, then any web addresses in the plain-text part that the HTML
 * did not already link to, so a text-only message still yields its links. Duplicates are dropped.
 */
export function extractLinks(html: string | null, text: string | null): string[] {
  const links = new Set<string>();
  for (const match of (html ?? "").matchAll(ANCHOR_HREF)) {
    const href = decodeEntities(match[1] ?? match[2] ?? match[3] ?? "").trim();
    if (href) links.add(href);
  }
  for (const match of (text ?? "").matchAll(TEXT_URL)) {
    links.add(match[0].replace(/[.,;:!?]+$/, ""));
  }
  return [...links];
}

/** Escaping stops markup injection but not `javascript:` URLs, so only these schemes become clickable. */
export function isSafeHref(href: string): boolean {
  return /^(https?:|mailto:)/i.test(href.trim());
}
