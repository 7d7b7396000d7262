import { DateTime } from 'luxon';
import { displayTimeZone } from '../../../lib/display-zone';
import { z } from 'zod';
import { auditPageSize } from '../api/get-audit-events';
import type { AuditListQuery } from '../api/keys';

const Before = z.iso.datetime({ offset: true });
const Uuid = z.uuid();
const Kind = z.string().regex(/^[a-z_]{1,40}$/);
const Day = z.iso.date();

/** What the audit page is filtered by, as the address holds it: the reader's own calendar days. */
export interface AuditFilters {
  /** A member's user id. */
  who?: string;
  /** The first part of an action, e.g. "lot". */
  kind?: string;
  /** Local calendar days, YYYY-MM-DD, both included. */
  from?: string;
  to?: string;
}

export interface AuditCursor {
  before?: string;
  beforeId?: string;
}

const valid = <T>(schema: z.ZodType<T>, value: string | null): T | undefined => {
  const read = schema.safeParse(value);
  return read.success ? read.data : undefined;
};

/** The filters in the address, each dropped when it is not something the API would take. */
export function readAuditFilters(search: URLSearchParams): AuditFilters {
  const out: AuditFilters = {};
  const who = valid(Uuid, search.get('who'));
  const kind = valid(Kind, search.get('kind'));
  const from = valid(Day, search.get('from'));
  const to = valid(Day, search.get('to'));
  if (who) out.who = who;
  if (kind) out.kind = kind;
  if (from) out.from = from;
  if (to && (!from || to >= from)) out.to = to;
  return out;
}

/** The instant a calendar day starts in the shop's time zone (daylight-saving days are 23 or 25 hours long). */
export function localDayStart(day: string, plusDays = 0): string {
  const [y, m, d] = day.split('-').map(Number) as [number, number, number];
  return DateTime.fromObject({ year: y, month: m, day: d }, { zone: displayTimeZone() ?? 'local' })
    .plus({ days: plusDays })
    .toUTC()
    .toISO()!;
}

/** The filters as the API takes them: the reader's days become instants, from the first day's start to the last day's end. */
export function auditApiFilters(f: AuditFilters): Omit<AuditListQuery, 'limit'> {
  const out: Omit<AuditListQuery, 'limit'> = {};
  if (f.who) out.actorId = f.who;
  if (f.kind) out.action = f.kind;
  if (f.from) out.from = localDayStart(f.from);
  if (f.to) out.to = localDayStart(f.to, 1);
  return out;
}

/** The audit list pages backwards in time: `?before=` and `?beforeId=` hold the oldest event already shown. */
export function readAuditQuery(search: URLSearchParams): AuditListQuery {
  const query: AuditListQuery = { limit: auditPageSize, ...auditApiFilters(readAuditFilters(search)) };
  const before = valid(Before, search.get('before'));
  if (before) {
    query.before = before;
    const beforeId = valid(Uuid, search.get('beforeId'));
    if (beforeId) query.beforeId = beforeId;
  }
  return query;
}
