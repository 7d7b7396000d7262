import { Info, type Zone } from 'luxon';

/**
 * A zone's UTC offset at an instant, remembered in 12-hour stretches of UTC time.
 *
 * Asking Intl for an offset costs microseconds, and a cure forecast walks half a year of hourly steps for every pour
 * on the board. Each stretch is asked once at its start and once at its end; where the two differ, the instant of the
 * change is found by halving the stretch down to the millisecond. So a stretch holds at most one change of offset:
 * two changes less than 12 hours apart do not occur in the tz database's rules for the years a pour is logged in.
 */
const stretchMs = 12 * 3_600_000;
/** Stretches kept per zone before its memory starts over (about 68 years of them). */
const maxStretches = 50_000;

interface Stretch {
  /** Offset in minutes at the stretch's start. */
  before: number;
  /** First instant of the new offset; Infinity where the stretch has no change. */
  changeMs: number;
  /** Offset in minutes from changeMs on. */
  after: number;
}

class ZoneOffsets {
  private readonly stretches = new Map<number, Stretch>();
  constructor(private readonly zone: Zone) {}

  private stretch(index: number): Stretch {
    const known = this.stretches.get(index);
    if (known) return known;
    if (this.stretches.size >= maxStretches) this.stretches.clear();
    const start = index * stretchMs;
    const before = this.zone.offset(start);
    const after = this.zone.offset(start + stretchMs);
    let changeMs = Infinity;
    if (after !== before) {
      let lo = start;
      let hi = start + stretchMs;
      while (hi - lo > 1) {
        const mid = Math.floor((lo + hi) / 2);
        if (this.zone.offset(mid) === before) lo = mid;
        else hi = mid;
      }
      changeMs = hi;
    }
    const s = { before, changeMs, after };
    this.stretches.set(index, s);
    return s;
  }

  offsetMinutes(ms: number): number {
    const s = this.stretch(Math.floor(ms / stretchMs));
    return ms < s.changeMs ? s.before : s.after;
  }

  /** True when the offset changes somewhere in (fromMs, toMs]. */
  changesBetween(fromMs: number, toMs: number): boolean {
    for (let i = Math.floor(fromMs / stretchMs); i <= Math.floor(toMs / stretchMs); i++) {
      const { changeMs } = this.stretch(i);
      if (changeMs > fromMs && changeMs <= toMs) return true;
    }
    return false;
  }
}

const zones = new Map<string, ZoneOffsets>();

/** The offset memory of a zone the caller has already checked (see checkZone): an IANA name, utc or a fixed offset. */
export function zoneOffsets(zone: string): ZoneOffsets {
  let z = zones.get(zone);
  if (!z) {
    z = new ZoneOffsets(Info.normalizeZone(zone));
    zones.set(zone, z);
  }
  return z;
}

export type { ZoneOffsets };
