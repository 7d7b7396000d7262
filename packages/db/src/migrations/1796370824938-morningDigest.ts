import type { MigrationInterface, QueryRunner } from 'typeorm';

export class MorningDigest1796370824938 implements MigrationInterface {
  name = 'MorningDigest1796370824938';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "reminders" ADD "via_digest" boolean NOT NULL DEFAULT false`);
    await queryRunner.query(`ALTER TABLE "shops" ADD "digest_on" date`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "digest_on"`);
    await queryRunner.query(`ALTER TABLE "reminders" DROP COLUMN "via_digest"`);
  }
}
