/** What the audit names an event in words: the object's name is kept apart, so a page can link it. */
export interface AuditSentence {
  /** e.g. "Lot", "Batch 2 logged on the pour of". */
  before: string;
  /** The object's name, e.g. "BRI-A-0412"; null when the event names no object. */
  name: string | null;
  /** e.g. "deleted". */
  after: string;
}

export interface AuditWordsInput {
  action: string;
  objectType: string;
  objectName: string | null;
  detail: Record<string, unknown>;
}

/** What each kind of object is called in a sentence. */
const nouns: Record<string, string> = {
  piece: 'Piece',
  pour_plan: 'Pour plan',
  mold: 'Mould',
  lot: 'Lot',
  resin_system: 'Resin system',
  pigment: 'Pigment',
  membership: 'Member',
  invitation: 'Invitation for',
  shop: 'Shop',
  user: 'Person',
};

/** Past-tense verbs by the action's last part; the kind of object says the rest. */
const verbs: Record<string, string> = {
  create: 'created',
  update: 'changed',
  delete: 'deleted',
  archive: 'archived',
  upload: 'uploaded',
  revoke: 'withdrawn',
  accept: 'accepted',
  void: 'voided',
};

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const count = (n: unknown, one: string, many: string) => (typeof n === 'number' ? `${n} ${n === 1 ? one : many}` : many);
const cupNumber = (index: unknown) => (typeof index === 'number' && Number.isInteger(index) ? ` ${index + 1}` : '');
const stageWords: Record<string, string> = { liquid: 'liquid', gelled: 'gelled', tack_free: 'tack-free', demoldable: 'demoldable', machinable: 'machinable' };

/** The event in words, e.g. { before: 'Lot', name: 'BRI-A-0412', after: 'deleted' }; unknown actions still read. */
export function auditSentence(e: AuditWordsInput): AuditSentence {
  const name = e.objectName;
  const d = e.detail;
  switch (e.action) {
    case 'session.open':
      return { before: 'Signed in', name: null, after: '' };
    case 'session.close':
      return { before: 'Signed out', name: null, after: '' };
    case 'password.reset':
      return { before: 'Password reset for', name, after: '' };
    case 'ingest_token.issue':
      return { before: 'New token for the shop thermometer issued', name: null, after: '' };
    case 'shop.update':
      return { before: 'Shop settings of', name, after: `changed${Object.keys(d).length ? ` (${Object.keys(d).join(', ')})` : ''}` };
    case 'lot.create':
      return { before: 'Lot', name, after: 'received' };
    case 'lot.update':
      return { before: 'Lot', name, after: 'corrected' };
    case 'resin_system.create':
    case 'pigment.create':
      return { before: nouns[e.objectType] ?? 'Product', name, after: 'added to the shelf' };
    case 'member.update':
      return {
        before: 'Member',
        name,
        after: `changed${typeof d.role === 'string' ? ` (role: ${d.role})` : ''}${typeof d.status === 'string' ? ` (${d.status})` : ''}`,
      };
    case 'invitation.create':
      return { before: 'Invitation sent to', name, after: typeof d.role === 'string' ? `as ${d.role}` : '' };
    case 'pour.start':
      return { before: 'Pour of', name, after: 'started' };
    case 'pour.release':
      return { before: 'Pour of', name, after: 'released for machining' };
    case 'pour.machined':
      return { before: 'Pour of', name, after: 'marked machined' };
    case 'batch.log':
      return { before: `Batch${cupNumber(d.planBatchIndex)} logged on the pour of`, name, after: '' };
    case 'readings.add':
      return { before: `${count(d.added, 'temperature reading', 'temperature readings')} added to the pour of`, name, after: '' };
    case 'cure_check.add':
      return { before: `Cure check${typeof d.stage === 'string' ? ` (${stageWords[d.stage] ?? d.stage})` : ''} recorded on the pour of`, name, after: '' };
  }
  const [kind = e.action, verb = ''] = e.action.split('.');
  const done = verbs[verb] ?? verb.replace(/_/g, ' ');
  // Something done to a part of a pour (a batch, a reading) is told as happening on the pour.
  if (e.objectType === 'pour' && kind !== 'pour') return { before: `${capital(kind.replace(/_/g, ' '))} ${done} on the pour of`, name, after: '' };
  const noun = e.objectType === 'pour' ? 'Pour of' : (nouns[e.objectType] ?? nouns[kind] ?? (e.objectType.replace(/_/g, ' ') || 'Object'));
  return { before: capital(noun), name, after: done };
}

/** The whole sentence, with who did it: "Lot BRI-A-0412 deleted by Ana Ruiz". */
export function auditText(e: AuditWordsInput & { actorName: string | null }): string {
  const s = auditSentence(e);
  const what = [s.before, s.name ?? '', s.after].filter((part) => part !== '').join(' ');
  return e.actorName ? `${what} by ${e.actorName}` : what;
}

/** The kinds of event the audit can be filtered by: the first part of an action, in words. */
export const auditKinds: readonly { kind: string; label: string }[] = [
  { kind: 'piece', label: 'Pieces' },
  { kind: 'mold', label: 'Moulds' },
  { kind: 'pour_plan', label: 'Pour plans' },
  { kind: 'pour', label: 'Pours started, released or machined' },
  { kind: 'batch', label: 'Batches logged' },
  { kind: 'readings', label: 'Temperature readings' },
  { kind: 'cure_check', label: 'Cure checks' },
  { kind: 'lot', label: 'Lots' },
  { kind: 'resin_system', label: 'Resin systems' },
  { kind: 'pigment', label: 'Pigments' },
  { kind: 'member', label: 'Members' },
  { kind: 'invitation', label: 'Invitations' },
  { kind: 'shop', label: 'Shop settings' },
  { kind: 'session', label: 'Sign-ins and sign-outs' },
  { kind: 'ingest_token', label: 'Thermometer tokens' },
];
