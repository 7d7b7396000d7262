import { getAttributeValue, findAll, textContent } from 'domutils';
import { decodeHTML } from 'entities';
import { parseDocument } from 'htmlparser2';
import { describe, expect, it } from 'vitest';
import { escapeHtml, linkifyText } from './html';

// htmlparser2 and entities (both on the registry, already installed at the root) are the
// independent HTML reader: what they read back must be exactly the text we meant to show.
function anchorsOf(html: string) {
  return findAll((node) => node.name === 'a', parseDocument(html).children).map((a) => ({
    href: getAttributeValue(a, 'href'),
    text: textContent(a),
  }));
}

describe('escapeHtml', () => {
  const hostile = `<script>alert("x")</script> & 'quoted' <img src=x onerror=alert(1)>`;

  it('reads back as the same text through an independent entity decoder', () => {
    expect(decodeHTML(escapeHtml(hostile))).toBe(hostile);
  });

  it('leaves no markup characters behind, so neither text nor a quoted attribute can be broken out of', () => {
    // HTML Living Standard §13.1.2.3/§13.1.4 (from memory): < starts a tag, & a reference, " and ' end attributes.
    expect(escapeHtml(hostile)).not.toMatch(/[<>"']/);
    const document = parseDocument(`<p title="${escapeHtml(hostile)}">${escapeHtml(hostile)}</p>`);
    const paragraphs = findAll(() => true, document.children);
    expect(paragraphs.map((element) => element.name)).toEqual(['p']);
    expect(getAttributeValue(paragraphs[0]!, 'title')).toBe(hostile);
    expect(textContent(document)).toBe(hostile);
  });
});

describe('linkifyText', () => {
  it('turns web links into anchors and keeps the surrounding text', () => {
    const text = 'Confirm here: https://gelpoint.test/invite?token=a1&shop=7. Or ignore (http://gelpoint.test/help)!';
    const html = linkifyText(text);
    expect(anchorsOf(html)).toEqual([
      { href: 'https://gelpoint.test/invite?token=a1&shop=7', text: 'https://gelpoint.test/invite?token=a1&shop=7' },
      { href: 'http://gelpoint.test/help', text: 'http://gelpoint.test/help' },
    ]);
    expect(textContent(parseDocument(html))).toBe(text);
  });

  it('never links a script or data URL and escapes markup in the text', () => {
    const text = 'javascript:alert(1) data:text/html,<b>x</b> <a href="https://evil.test">y</a>';
    const html = linkifyText(text);
    expect(anchorsOf(html).map((anchor) => anchor.href)).toEqual(['https://evil.test']);
    expect(findAll((node) => node.name === 'b', parseDocument(html).children)).toEqual([]);
    expect(textContent(parseDocument(html))).toBe(text);
  });

  it('gives plain text without links back unchanged apart from escaping', () => {
    expect(linkifyText('Demold after 24 h < 30 °C')).toBe('Demold after 24 h &lt; 30 °C');
  });
});
