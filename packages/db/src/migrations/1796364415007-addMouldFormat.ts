import type { MigrationInterface, QueryRunner } from 'typeorm';

export class AddMouldFormat1796364415007 implements MigrationInterface {
  name = 'AddMouldFormat1796364415007';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "molds" ADD "format" text NOT NULL DEFAULT 'stl'`);
    await queryRunner.query(`ALTER TABLE "molds" ADD "file_units" text`);
    await queryRunner.query(`ALTER TABLE "molds" ADD CONSTRAINT "molds_format_check" CHECK (format IN ('stl', '3mf', 'obj'))`);
    await queryRunner.query(
      `ALTER TABLE "molds" ADD CONSTRAINT "molds_file_units_check" CHECK (file_units IS NULL OR file_units IN ('um', 'mm', 'cm', 'm', 'in', 'ft'))`,
    );
    // A 3MF may state micron, metre or foot: the units a mould is read in widen to match.
    await queryRunner.query(`ALTER TABLE "molds" DROP CONSTRAINT "molds_units_check"`);
    await queryRunner.query(`ALTER TABLE "molds" ADD CONSTRAINT "molds_units_check" CHECK (units IN ('um', 'mm', 'cm', 'm', 'in', 'ft'))`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    // The older schema holds mm, cm and in only; a mould read in another unit cannot stay in it.
    await queryRunner.query(`DELETE FROM "molds" WHERE units NOT IN ('mm', 'cm', 'in')`);
    await queryRunner.query(`ALTER TABLE "molds" DROP CONSTRAINT "molds_units_check"`);
    await queryRunner.query(`ALTER TABLE "molds" ADD CONSTRAINT "molds_units_check" CHECK (units IN ('mm', 'cm', 'in'))`);
    await queryRunner.query(`ALTER TABLE "molds" DROP CONSTRAINT "molds_file_units_check"`);
    await queryRunner.query(`ALTER TABLE "molds" DROP CONSTRAINT "molds_format_check"`);
    await queryRunner.query(`ALTER TABLE "molds" DROP COLUMN "file_units"`);
    await queryRunner.query(`ALTER TABLE "molds" DROP COLUMN "format"`);
  }
}
