import type { EntityManager } from 'typeorm';
import { dayNightShopTemperature, learnedProfileDays, learnedShopTemperature, type AssumedTemperature } from '@gelpoint/core';
import type { ShopTemperatureProfile } from '@gelpoint/db';

/** What a pour assumes where nothing is logged, given the plan's own shop temperature. */
export type AssumedFor = (planTempC: number) => AssumedTemperature;

/**
 * The shop's temperature profile as the cure model takes it: the plan's constant, the shop's day and night, or each
 * hour as the shop's readings of the last week showed it (the plan's constant while there are none).
 */
export async function shopTemperatureFor(m: EntityManager, shopId: string, now: Date): Promise<AssumedFor> {
  const rows: { time_zone: string; temperature_profile: ShopTemperatureProfile }[] = await m.query(
    'SELECT time_zone, temperature_profile FROM shops WHERE id = $1',
    [shopId],
  );
  const shop = rows[0];
  const profile = shop?.temperature_profile ?? { mode: 'plan' };
  if (!shop || profile.mode === 'plan') return (planTempC) => planTempC;
  if (profile.mode === 'day_night') {
    const dayNight = dayNightShopTemperature({ ...profile, zone: shop.time_zone });
    return dayNight.ok ? () => dayNight.value : (planTempC) => planTempC;
  }
  const readings: { taken_at: Date; temp_c: number }[] = await m.query(
    `SELECT taken_at, temp_c FROM temperature_readings WHERE shop_id = $1 AND voided_at IS NULL AND taken_at > $2 AND taken_at <= $3`,
    [shopId, new Date(now.getTime() - learnedProfileDays * 86_400_000), now],
  );
  const learned = learnedShopTemperature(
    readings.map((r) => ({ ms: r.taken_at.getTime(), tempC: r.temp_c })),
    shop.time_zone,
    now.getTime(),
  );
  return learned.ok ? () => learned.value : (planTempC) => planTempC;
}

export async function assumedTemperatureOf(m: EntityManager, shopId: string, planTempC: number, now: Date): Promise<AssumedTemperature> {
  return (await shopTemperatureFor(m, shopId, now))(planTempC);
}
