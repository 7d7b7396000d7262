import { In, type DataSource } from 'typeorm';
import ical, { ICalAlarmType, ICalCalendarMethod } from 'ical-generator';
import { Piece, Pour, PourPlan, Reminder } from '@gelpoint/db';
import { notFound } from '../../http/errors';
import { pourStateOf } from '../pours/pour-cure-state';
import { cureSettingsOf, groupByPour, loadedOf } from '../pours/pour-queries';
import { assumedTemperatureOf } from '../pours/shop-temperature-of';
import { feedTokenHash } from './calendar-token';

// A cure stage already announced by a reminder of the cure model is not listed twice.
const announcedByReminder = new Set(['next_layer_opens', 'next_layer_closes', 'demold', 'ready_to_machine']);

const stageWords: Record<string, string> = {
  gel: 'gels',
  tack_free: 'is tack-free',
  full_cure: 'reaches full cure',
  next_layer_opens: 'window for the next pour opens',
  next_layer_closes: 'window for the next pour closes',
  demold: 'can be demolded',
  ready_to_machine: 'is ready to machine',
};

function stepWords(key: string): string {
  const [kind, n] = key.split(':');
  return kind === 'seal_coat' ? `seal coat ${n}` : kind === 'layer' ? `layer ${n}` : `finish coat ${n}`;
}

/** A member's private feed: every coming reminder and cure step of the shop's open pours, as RFC 5545 text. */
export class CalendarFeeds {
  constructor(
    private readonly ds: DataSource,
    private readonly publicUrl: string,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async feed(token: string): Promise<string> {
    const m = this.ds.manager;
    const members: { shop_id: string; shop_name: string; time_zone: string }[] = await m.query(
      `SELECT ms.shop_id, s.name AS shop_name, s.time_zone FROM memberships ms JOIN shops s ON s.id = ms.shop_id
        WHERE ms.calendar_token_hash = $1 AND ms.status = 'active'`,
      [feedTokenHash(token)],
    );
    const member = members[0];
    if (!member) throw notFound('calendar feed');
    const now = this.now();
    const calendar = ical({
      name: `${member.shop_name}: pours (Gelpoint)`,
      prodId: { company: 'Gelpoint', product: 'pour calendar', language: 'EN' },
      method: ICalCalendarMethod.PUBLISH,
      ttl: 15 * 60,
    });

    const pours = await m.find(Pour, { where: { shopId: member.shop_id, status: 'open' } });
    const ids = pours.map((p) => p.id);
    const plans = new Map((await m.findBy(PourPlan, { id: In(pours.map((p) => p.pourPlanId)) })).map((p) => [p.id, p]));
    const pieces = new Map((await m.findBy(Piece, { id: In(pours.map((p) => p.pieceId)) })).map((p) => [p.id, p]));
    const reminders = ids.length ? await m.find(Reminder, { where: { pourId: In(ids) }, order: { eventAt: 'ASC' } }) : [];
    const logged = groupByPour<{ pour_id: string; step: string; mixed_at: Date }>(
      ids.length ? await m.query('SELECT pour_id, step, mixed_at FROM pour_batches WHERE pour_id = ANY($1) AND voided_at IS NULL', [ids]) : [],
    );
    const readings = groupByPour<{ pour_id: string; taken_at: Date; temp_c: number }>(
      ids.length
        ? await m.query('SELECT pour_id, taken_at, temp_c FROM temperature_readings WHERE pour_id = ANY($1) AND voided_at IS NULL ORDER BY taken_at', [ids])
        : [],
    );
    const checks = groupByPour<{ pour_id: string; checked_at: Date; hardness_shore_d: number | null; stage: string }>(
      ids.length ? await m.query('SELECT pour_id, checked_at, hardness_shore_d, stage FROM cure_checks WHERE pour_id = ANY($1)', [ids]) : [],
    );
    const settings = await cureSettingsOf(m, member.shop_id);

    for (const pour of pours) {
      const piece = pieces.get(pour.pieceId)!;
      const link = `${this.publicUrl}/pours/${pour.id}`;
      for (const r of reminders.filter((x) => x.pourId === pour.id && x.status !== 'cancelled' && x.doneAt === null && x.eventAt >= now)) {
        const event = calendar.createEvent({
          id: `reminder-${r.id}@gelpoint`,
          start: r.eventAt,
          end: new Date(r.eventAt.getTime() + 15 * 60_000),
          summary: r.title,
          description: `${piece.name}: ${r.title}.${r.assumed ? ' The time rests partly on the assumed shop temperature.' : ''} Open the pour: ${link}`,
          url: link,
        });
        // A closing window rings on the phone as far ahead as the shop's reminder goes out (the evening before for
        // one that closes in the night).
        if (r.leadMin > 0) event.createAlarm({ type: ICalAlarmType.display, trigger: r.leadMin * 60, description: r.title });
      }
      const l = loadedOf(pour, plans.get(pour.pourPlanId)!, piece);
      const log = (readings.get(pour.id) ?? []).map((x) => ({ at: x.taken_at.toISOString(), tempC: x.temp_c }));
      const assumed = await assumedTemperatureOf(m, member.shop_id, pour.assumedTempC, now);
      const { state } = pourStateOf(
        l,
        settings,
        logged.get(pour.id) ?? [],
        log,
        (checks.get(pour.id) ?? []).map((c) => ({ checkedAt: c.checked_at, hardnessShoreD: c.hardness_shore_d, stage: c.stage })),
        now,
        assumed,
      );
      if (!state.step || !state.status) continue;
      for (const stage of state.status.stages) {
        if (stage.reached || !stage.predictedAt || announcedByReminder.has(stage.key)) continue;
        const at = new Date(stage.predictedAt);
        calendar.createEvent({
          id: `pour-${pour.id}-${state.step.key}-${stage.key}@gelpoint`,
          start: at,
          end: new Date(at.getTime() + 15 * 60_000),
          summary: `${piece.name}, ${stepWords(state.step.key)} ${stageWords[stage.key] ?? stage.key} (forecast)`,
          description: `Forecast from the logged temperatures and the shop's own pattern; check the piece before you act. Open the pour: ${link}`,
          url: link,
        });
      }
    }
    return calendar.toString();
  }
}
