const ENTITIES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/** Safe in text and in quoted attribute values alike. */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (character) => ENTITIES[character] ?? character);
}

// Only http(s): a javascript: or data: link in a received mail must never become clickable.
const WEB_LINK = /\bhttps?:\/\/[^\s<>"']+/g;
// Sentence punctuation right after a link belongs to the sentence, not to the link.
const TRAILING_PUNCTUATION = /[.,;:!?)\]}]+$/;

/** Escapes plain text and turns the web links in it into anchors. */
export function linkifyText(text: string): string {
  let html = '';
  let position = 0;
  for (const match of text.matchAll(WEB_LINK)) {
    const start = match.index;
    const url = match[0].replace(TRAILING_PUNCTUATION, '');
    html += escapeHtml(text.slice(position, start));
    html += `<a href="${escapeHtml(url)}" rel="noreferrer noopener">${escapeHtml(url)}</a>`;
    position = start + url.length;
  }
  return html + escapeHtml(text.slice(position));
}
