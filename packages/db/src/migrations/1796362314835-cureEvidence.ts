import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CureEvidence1796362314835 implements MigrationInterface {
  name = 'CureEvidence1796362314835';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "shops" ADD "reading_carry_h" double precision NOT NULL DEFAULT '2'`);
    await queryRunner.query(`ALTER TABLE "shops" ADD "window_close_lead_min" integer NOT NULL DEFAULT '30'`);
    await queryRunner.query(`ALTER TABLE "resin_systems" ADD "hardness_shore_d" double precision`);
    // Pigments already on a shelf get a typical density for their kind (from memory of typical data
    // sheets: liquid colourants about 1.0 g/mL, pastes about 1.3, mica powders about 2.8); the lead can correct it.
    await queryRunner.query(`ALTER TABLE "pigments" ADD "density_g_per_ml" double precision`);
    await queryRunner.query(`UPDATE "pigments" SET "density_g_per_ml" = CASE kind WHEN 'liquid' THEN 1.0 WHEN 'paste' THEN 1.3 ELSE 2.8 END`);
    await queryRunner.query(`ALTER TABLE "pigments" ALTER COLUMN "density_g_per_ml" SET NOT NULL`);
    // Reminders already computed announce their own moment.
    await queryRunner.query(`ALTER TABLE "reminders" ADD "event_at" TIMESTAMP WITH TIME ZONE`);
    await queryRunner.query(`UPDATE "reminders" SET "event_at" = "due_at"`);
    await queryRunner.query(`ALTER TABLE "reminders" ALTER COLUMN "event_at" SET NOT NULL`);
    await queryRunner.query(`ALTER TABLE "reminders" ADD "lead_min" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(
      `ALTER TABLE "shops" ADD CONSTRAINT "shops_window_close_lead_check" CHECK (window_close_lead_min >= 0 AND window_close_lead_min <= 720)`,
    );
    await queryRunner.query(`ALTER TABLE "shops" ADD CONSTRAINT "shops_reading_carry_check" CHECK (reading_carry_h >= 0 AND reading_carry_h <= 48)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "shops" DROP CONSTRAINT "shops_reading_carry_check"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP CONSTRAINT "shops_window_close_lead_check"`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP COLUMN "lead_min"`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP COLUMN "event_at"`);
    await queryRunner.query(`ALTER TABLE "pigments" DROP COLUMN "density_g_per_ml"`);
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP COLUMN "hardness_shore_d"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "window_close_lead_min"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "reading_carry_h"`);
  }
}
