import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ShopClock1796369837636 implements MigrationInterface {
  name = 'ShopClock1796369837636';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "shops" ADD "time_zone" text NOT NULL DEFAULT 'UTC'`);
    await queryRunner.query(`ALTER TABLE "shops" ADD "temperature_profile" jsonb NOT NULL DEFAULT '{"mode":"plan"}'::jsonb`);
    await queryRunner.query(`ALTER TABLE "shops" ADD "day_start_hour" integer NOT NULL DEFAULT '7'`);
    await queryRunner.query(`ALTER TABLE "shops" ADD "quiet_from_hour" integer NOT NULL DEFAULT '21'`);
    await queryRunner.query(`ALTER TABLE "memberships" ADD "calendar_token_salt" text`);
    await queryRunner.query(`ALTER TABLE "memberships" ADD "calendar_token_hash" text`);
    await queryRunner.query(`CREATE UNIQUE INDEX "memberships_calendar_token_key" ON "memberships" ("calendar_token_hash") `);
    await queryRunner.query(`ALTER TABLE "shops" ADD CONSTRAINT "shops_quiet_from_hour_check" CHECK (quiet_from_hour >= 0 AND quiet_from_hour <= 23)`);
    await queryRunner.query(`ALTER TABLE "shops" ADD CONSTRAINT "shops_day_start_hour_check" CHECK (day_start_hour >= 0 AND day_start_hour <= 23)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "shops" DROP CONSTRAINT "shops_day_start_hour_check"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP CONSTRAINT "shops_quiet_from_hour_check"`);
    await queryRunner.query(`DROP INDEX "public"."memberships_calendar_token_key"`);
    await queryRunner.query(`ALTER TABLE "memberships" DROP COLUMN "calendar_token_hash"`);
    await queryRunner.query(`ALTER TABLE "memberships" DROP COLUMN "calendar_token_salt"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "quiet_from_hour"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "day_start_hour"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "temperature_profile"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "time_zone"`);
  }
}
