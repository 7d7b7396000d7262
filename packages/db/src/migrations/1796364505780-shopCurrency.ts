import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ShopCurrency1796364505780 implements MigrationInterface {
  name = 'ShopCurrency1796364505780';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "shops" ADD "currency" text NOT NULL DEFAULT 'USD'`);
    await queryRunner.query(`ALTER TABLE "shops" ADD CONSTRAINT "shops_currency_check" CHECK (currency ~ '^[A-Z]{3}$')`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "shops" DROP CONSTRAINT "shops_currency_check"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "currency"`);
  }
}
