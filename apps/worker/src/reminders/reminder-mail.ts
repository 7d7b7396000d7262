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
}

/** The e-mail a due reminder becomes. Plain text: it reads on any phone in the shop. */
export function reminderMail(r: DueReminder, publicUrl: string): { subject: string; text: string } {
  if (r.kind === 'piece_released' || r.kind === 'piece_machined') return noticeMail(r, publicUrl);
  const basis = r.assumed
    ? 'This time rests partly on the plan’s assumed shop temperature, not only on logged readings: check the piece before you act.'
    : 'This time comes from the temperatures logged for the pour.';
  const when =
    r.lead_min > 0
      ? `Closes: ${r.event_at.toUTCString()}, ${r.lead_min} min after this message is sent: pour before then.`
      : `Due: ${r.event_at.toUTCString()}`;
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
      `${r.title}\n\nPiece: ${r.piece_name}\nPlan: ${r.plan_name}\nWhen: ${r.event_at.toUTCString()}\n\n` +
      `Open the pour: ${publicUrl}/pours/${r.pour_id}\n\n` +
      'Machine with dust extraction and eye protection; cured resin dust still irritates. Follow the product’s SDS and TDS.\n\n— Gelpoint',
  };
}
