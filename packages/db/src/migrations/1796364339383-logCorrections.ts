import type { MigrationInterface, QueryRunner } from 'typeorm';

export class LogCorrections1796364339383 implements MigrationInterface {
  name = 'LogCorrections1796364339383';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "pour_batches" ADD "voided_at" TIMESTAMP WITH TIME ZONE`);
    await queryRunner.query(`ALTER TABLE "pour_batches" ADD "voided_by_id" uuid`);
    await queryRunner.query(`ALTER TABLE "pour_batches" ADD "void_reason" text`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" ADD "logged_by_id" uuid`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" ADD "voided_at" TIMESTAMP WITH TIME ZONE`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" ADD "voided_by_id" uuid`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" ADD "void_reason" text`);
    await queryRunner.query(`ALTER TABLE "reminders" ADD "done_at" TIMESTAMP WITH TIME ZONE`);
    await queryRunner.query(`ALTER TABLE "reminders" ADD "done_by_id" uuid`);
    await queryRunner.query(`ALTER TABLE "reminders" ADD "done_how" text`);
    await queryRunner.query(`ALTER TABLE "reminders" ADD "recipient_user_ids" uuid array`);
    await queryRunner.query(`ALTER TABLE "reminders" ADD CONSTRAINT "reminders_done_how_check" CHECK (done_how IN ('logged', 'marked'))`);
    // One live row per moment and per run-sheet place; voided rows stay beside it as history.
    await queryRunner.query(`DROP INDEX "public"."temperature_readings_pour_time_key"`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "temperature_readings_pour_time_key" ON "temperature_readings" ("pour_id", "taken_at") WHERE voided_at IS NULL`,
    );
    await queryRunner.query(`DROP INDEX "public"."pour_batches_pour_index_key"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "pour_batches_pour_index_key" ON "pour_batches" ("pour_id", "plan_batch_index") WHERE voided_at IS NULL`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM "pour_batches" WHERE voided_at IS NOT NULL`);
    await queryRunner.query(`DELETE FROM "temperature_readings" WHERE voided_at IS NOT NULL`);
    await queryRunner.query(`DROP INDEX "public"."pour_batches_pour_index_key"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "pour_batches_pour_index_key" ON "pour_batches" ("pour_id", "plan_batch_index")`);
    await queryRunner.query(`DROP INDEX "public"."temperature_readings_pour_time_key"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "temperature_readings_pour_time_key" ON "temperature_readings" ("pour_id", "taken_at")`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP CONSTRAINT "reminders_done_how_check"`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP COLUMN "recipient_user_ids"`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP COLUMN "done_how"`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP COLUMN "done_by_id"`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP COLUMN "done_at"`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" DROP COLUMN "void_reason"`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" DROP COLUMN "voided_by_id"`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" DROP COLUMN "voided_at"`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" DROP COLUMN "logged_by_id"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP COLUMN "void_reason"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP COLUMN "voided_by_id"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP COLUMN "voided_at"`);
  }
}
