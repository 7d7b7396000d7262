import { escapeHtml, linkifyText } from './html';
import type { SinkMessage } from './sink-message';

export interface SmtpEndpoint {
  host: string;
  port: number;
}

const STYLE = `
  :root { color-scheme: light dark; --line: #8884; --muted: #888; --accent: #2f7d6d; }
  body { font: 15px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, sans-serif; margin: 0; }
  header { padding: 14px 24px; border-bottom: 3px solid var(--accent); display: flex; gap: 16px; align-items: baseline; flex-wrap: wrap; }
  header h1 { font-size: 18px; margin: 0; }
  header p { margin: 0; color: var(--muted); }
  main { padding: 16px 24px; max-width: 1100px; }
  table { border-collapse: collapse; width: 100%; }
  th, td { text-align: left; padding: 6px 8px; border-bottom: 1px solid var(--line); vertical-align: top; }
  th { font-weight: 600; font-size: 13px; color: var(--muted); }
  td.when { white-space: nowrap; font-variant-numeric: tabular-nums; }
  a { color: var(--accent); }
  a:focus-visible, input:focus-visible, button:focus-visible { outline: 2px solid var(--accent); outline-offset: 2px; }
  form { display: flex; gap: 8px; align-items: center; margin-bottom: 14px; }
  input { font: inherit; padding: 4px 6px; min-width: 260px; }
  button { font: inherit; padding: 4px 10px; }
  dl { display: grid; grid-template-columns: max-content 1fr; gap: 4px 14px; margin: 0 0 16px; }
  dt { color: var(--muted); }
  dd { margin: 0; overflow-wrap: anywhere; }
  pre { white-space: pre-wrap; overflow-wrap: anywhere; padding: 12px; border: 1px solid var(--line); border-radius: 4px; }
  iframe { width: 100%; height: 480px; border: 1px solid var(--line); border-radius: 4px; background: #fff; }
  .empty { color: var(--muted); }
`;

function layout(title: string, smtp: SmtpEndpoint, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<header><h1><a href="/">Gelpoint mail sink</a></h1><p>SMTP on ${escapeHtml(smtp.host)}:${smtp.port} · JSON at <a href="/api/messages">/api/messages</a></p></header>
<main>
${body}
</main>
</body>
</html>
`;
}

/** Shown in the list as "YYYY-MM-DD HH:MM:SS UTC": sortable by eye and the same for everyone. */
function whenText(iso: string): string {
  return `${iso.slice(0, 19).replace('T', ' ')} UTC`;
}

function messageHref(message: SinkMessage): string {
  return `/messages/${encodeURIComponent(message.id)}`;
}

export function renderInboxPage(messages: SinkMessage[], smtp: SmtpEndpoint, recipientFilter: string): string {
  const rows = messages
    .map(
      (message) => `<tr>
<td class="when"><time datetime="${escapeHtml(message.receivedAt)}">${escapeHtml(whenText(message.receivedAt))}</time></td>
<td>${escapeHtml(message.to.join(', '))}</td>
<td><a href="${escapeHtml(messageHref(message))}">${escapeHtml(message.subject || '(no subject)')}</a></td>
</tr>`,
    )
    .join('\n');
  const filterNote = recipientFilter ? ` to ${escapeHtml(recipientFilter)}` : '';
  const list =
    messages.length === 0
      ? `<p class="empty">No mail${filterNote} yet.</p>`
      : `<table>
<caption hidden>Received mail, newest first</caption>
<thead><tr><th scope="col">Received</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>`;
  const form = `<form method="get" action="/">
<label for="to">Recipient</label>
<input id="to" name="to" type="email" value="${escapeHtml(recipientFilter)}" placeholder="any">
<button type="submit">Filter</button>
${recipientFilter ? '<a href="/">Show all</a>' : ''}
</form>`;
  const count = `<p>${messages.length} message${messages.length === 1 ? '' : 's'}${filterNote}, newest first.</p>`;
  return layout('Gelpoint mail sink', smtp, `${form}\n${count}\n${list}`);
}

export function renderMessagePage(message: SinkMessage, smtp: SmtpEndpoint): string {
  const field = (label: string, value: string) => `<dt>${label}</dt><dd>${escapeHtml(value)}</dd>`;
  const headers = [
    field('Subject', message.subject || '(no subject)'),
    field('From', message.from),
    field('To', message.to.join(', ')),
    message.cc.length > 0 ? field('Cc', message.cc.join(', ')) : '',
    field('Date', message.date),
    field('Received', message.receivedAt),
    field('Message-ID', message.messageId ?? '(none)'),
    field('Envelope', `${message.envelope.mailFrom ?? '<>'} → ${message.envelope.rcptTo.join(', ')}`),
  ].join('\n');
  // sandbox="" gives the mail's HTML no scripts, no forms, no top navigation and a unique origin.
  const htmlBody =
    message.html === null
      ? ''
      : `<h2>HTML body</h2>
<iframe title="HTML body of the message" sandbox="" srcdoc="${escapeHtml(message.html)}"></iframe>`;
  const body = `<p><a href="/">← All mail</a> · <a href="/api/messages/${escapeHtml(encodeURIComponent(message.id))}">JSON</a></p>
<dl>
${headers}
</dl>
<h2>Text body</h2>
<pre>${linkifyText(message.text)}</pre>
${htmlBody}`;
  return layout(`${message.subject || '(no subject)'} · Gelpoint mail sink`, smtp, body);
}
