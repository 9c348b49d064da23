import { describe, expect, it } from "vitest";
import { decodeEntities, escapeHtml, extractLinks, isSafeHref } from "@/fakes/mail/html-text";

describe("escapeHtml", () => {
  it("escapes the five characters that matter in content and quoted attributes", () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe("&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;");
  });
});

describe("decodeEntities", () => {
  it("decodes named, decimal and hexadecimal references and leaves unknown ones alone", () => {
    expect(decodeEntities("a&amp;b&#61;c&#x3D;d&unknown;&#0;")).toBe("a&b=c=d&unknown;&#0;");
  });
});

describe("extractLinks", () => {
  it("finds hrefs in any quoting style, in order, without duplicates", () => {
    const html = `<a class="btn" href="https://a.test/1?x=1&amp;y=2">1</a> <a href='https://a.test/2'>2</a>
      <A HREF=https://a.test/3>3</A> <a data-href="https://no.test">x</a> <a href="https://a.test/2">again</a>`;

    expect(extractLinks(html, null)).toEqual(["https://a.test/1?x=1&y=2", "https://a.test/2", "https://a.test/3"]);
  });

  it("adds web addresses from the plain text, trimming sentence punctuation", () => {
    const text = "Reset here: http://127.0.0.1:3000/reset?token=abc. Or visit https://a.test/1?x=1&y=2, thanks.";

    expect(extractLinks('<a href="https://a.test/1?x=1&amp;y=2">x</a>', text)).toEqual([
      "https://a.test/1?x=1&y=2",
      "http://127.0.0.1:3000/reset?token=abc",
    ]);
  });
});

describe("isSafeHref", () => {
  it.each([
    ["https://a.test", true],
    ["HTTP://a.test", true],
    ["mailto:ada@example.com", true],
    ["javascript:alert(1)", false],
    [" JavaScript:alert(1)", false],
    ["data:text/html,<script>", false],
  ])("%j → %s", (href, safe) => {
    expect(isSafeHref(href)).toBe(safe);
  });
});
