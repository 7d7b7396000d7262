import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RateLimitCounters1796175582050 implements MigrationInterface {
  name = 'RateLimitCounters1796175582050';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "rate_limit_counters" ("key" text NOT NULL, "hits" integer NOT NULL, "reset_at" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "rate_limit_counters_pkey" PRIMARY KEY ("key"))`,
    );
    await queryRunner.query(`CREATE INDEX "rate_limit_counters_reset_idx" ON "rate_limit_counters" ("reset_at") `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "public"."rate_limit_counters_reset_idx"`);
    await queryRunner.query(`DROP TABLE "rate_limit_counters"`);
  }
}
