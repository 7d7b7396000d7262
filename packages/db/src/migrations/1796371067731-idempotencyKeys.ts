import type { MigrationInterface, QueryRunner } from 'typeorm';

export class IdempotencyKeys1796371067731 implements MigrationInterface {
  name = 'IdempotencyKeys1796371067731';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "idempotency_keys" ("shop_id" uuid NOT NULL, "user_id" uuid NOT NULL, "key" text NOT NULL, "route" text NOT NULL, "fingerprint" text NOT NULL, "status_code" integer, "response_body" json, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "completed_at" TIMESTAMP WITH TIME ZONE, CONSTRAINT "idempotency_keys_key_check" CHECK (char_length(key) BETWEEN 1 AND 255), CONSTRAINT "idempotency_keys_pkey" PRIMARY KEY ("shop_id", "user_id", "key"))`,
    );
    await queryRunner.query(`CREATE INDEX "idempotency_keys_created_idx" ON "idempotency_keys" ("created_at") `);
    await queryRunner.query(
      `ALTER TABLE "idempotency_keys" ADD CONSTRAINT "idempotency_keys_user_fk" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "idempotency_keys" ADD CONSTRAINT "idempotency_keys_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "idempotency_keys" DROP CONSTRAINT "idempotency_keys_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "idempotency_keys" DROP CONSTRAINT "idempotency_keys_user_fk"`);
    await queryRunner.query(`DROP INDEX "public"."idempotency_keys_created_idx"`);
    await queryRunner.query(`DROP TABLE "idempotency_keys"`);
  }
}
