import { shopClockWords, shopLocalDate, shopTimeWords } from '@gelpoint/core';

export interface DigestItem {
  id: string;
  title: string;
  kind: string;
  event_at: Date;
  due_at: Date;
  lead_min: number;
  assumed: boolean;
  pour_id: string;
  piece_name: string;
  /** Held through the night for this digest (it is sent by it), or only coming up later today. */
  held: boolean;
}

/** A time in the digest: the clock alone on the digest's own day, the date too otherwise. */
function when(ms: number, zone: string, today: string): string {
  return shopLocalDate(ms, zone) === today ? shopClockWords(ms, zone) : shopTimeWords(ms, zone);
}

function line(i: DigestItem, zone: string, today: string, publicUrl: string): string {
  const closes = i.lead_min > 0 ? `closes ${when(i.event_at.getTime(), zone, today)}` : when(i.event_at.getTime(), zone, today);
  const basis = i.assumed ? ' (partly on the assumed shop temperature: check by hand)' : '';
  return `- ${closes}: ${i.title}${basis}\n  ${publicUrl}/pours/${i.pour_id}`;
}

/** The morning digest a member gets: what came due overnight, then what comes due in the next 24 hours, in local time. */
export function digestMail(p: { shopName: string; zone: string; nowMs: number; items: DigestItem[]; publicUrl: string }): { subject: string; text: string } {
  const today = shopLocalDate(p.nowMs, p.zone);
  const byTime = (a: DigestItem, b: DigestItem) => a.event_at.getTime() - b.event_at.getTime();
  const overnight = p.items.filter((i) => i.held).sort(byTime);
  const coming = p.items.filter((i) => !i.held).sort(byTime);
  const parts = [`Good morning. This is what ${p.shopName} has coming, as of ${shopTimeWords(p.nowMs, p.zone)}.`];
  if (overnight.length > 0) parts.push(`While the shop was quiet:\n${overnight.map((i) => line(i, p.zone, today, p.publicUrl)).join('\n')}`);
  if (coming.length > 0) parts.push(`In the next 24 hours:\n${coming.map((i) => line(i, p.zone, today, p.publicUrl)).join('\n')}`);
  parts.push(
    'Times are forecasts from the logged cure; check each piece by hand before you demold or machine it. ' +
      'Mix with gloves and eye protection in a ventilated space, and follow the product’s SDS and TDS.',
  );
  const count = p.items.length;
  return {
    subject: `${p.shopName}: ${count} thing${count === 1 ? '' : 's'} due today (${today})`,
    text: `${parts.join('\n\n')}\n\n— Gelpoint`,
  };
}
