import { quietStretchAt, shopTimeWords, type ShopHours } from '@gelpoint/core';

export interface DueReminder {
  id: string;
  title: string;
  kind: string;
  due_at: Date;
  /** The moment of the step; a closing window's mail goes out lead_min before it. */
  event_at: Date;
  lead_min: number;
  assumed: boolean;
  pour_id: string;
  shop_id: string;
  piece_name: string;
  plan_name: string;
  /** The shop's clock: every time in the mail is in its zone. */
  time_zone: string;
  day_start_hour: number;
  quiet_from_hour: number;
}

export const hoursOfRow = (r: Pick<DueReminder, 'time_zone' | 'day_start_hour' | 'quiet_from_hour'>): ShopHours => ({
  zone: r.time_zone,
  dayStartHour: r.day_start_hour,
  quietFromHour: r.quiet_from_hour,
});

/** "45 min", "5 h", "5 h 30 min". */
export function durationWords(min: number): string {
  if (min < 90) return `${min} min`;
  const h = Math.floor(min / 60);
  const rest = min % 60;
  return rest === 0 ? `${h} h` : `${h} h ${rest} min`;
}

/** The e-mail a due reminder becomes. Plain text: it reads on any phone in the shop. */
export function reminderMail(r: DueReminder, publicUrl: string): { subject: string; text: string } {
  if (r.kind === 'piece_released' || r.kind === 'piece_machined') return noticeMail(r, publicUrl);
  const basis = r.assumed
    ? 'This time rests partly on the plan’s assumed shop temperature, not only on logged readings: check the piece before you act.'
    : 'This time comes from the temperatures logged for the pour.';
  const at = shopTimeWords(r.event_at.getTime(), r.time_zone);
  const overnight = r.lead_min > 0 && quietStretchAt(r.event_at.getTime(), hoursOfRow(r)) !== null;
  const when =
    r.lead_min > 0
      ? `Closes: ${at}, ${durationWords(r.lead_min)} after this reminder was due: pour before then.` +
        (overnight ? '\nIt closes during the shop’s quiet hours, so this reminder comes the evening before.' : '')
      : `Due: ${at}`;
  return {
    subject: r.title,
    text:
      `${r.title}\n\nPiece: ${r.piece_name}\nPlan: ${r.plan_name}\n${when}\n\n${basis}\n\n` +
      `Open the pour: ${publicUrl}/pours/${r.pour_id}\n\n` +
      'Check by hand before demolding or machining, wear gloves and eye protection, and follow the product’s SDS and TDS.\n\n— Gelpoint',
  };
}

/** A notice of something done to a piece (a release, machining): what happened, when, and the link. */
function noticeMail(r: DueReminder, publicUrl: string): { subject: string; text: string } {
  return {
    subject: r.title,
    text:
      `${r.title}\n\nPiece: ${r.piece_name}\nPlan: ${r.plan_name}\nWhen: ${shopTimeWords(r.event_at.getTime(), r.time_zone)}\n\n` +
      `Open the pour: ${publicUrl}/pours/${r.pour_id}\n\n` +
      'Machine with dust extraction and eye protection; cured resin dust still irritates. Follow the product’s SDS and TDS.\n\n— Gelpoint',
  };
}
