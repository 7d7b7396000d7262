import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PoursCureLogReminders1796169088290 implements MigrationInterface {
  name = 'PoursCureLogReminders1796169088290';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "pours" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "piece_id" uuid NOT NULL, "pour_plan_id" uuid NOT NULL, "status" text NOT NULL DEFAULT 'open', "assumed_temp_c" double precision NOT NULL, "notify_user_ids" uuid array NOT NULL DEFAULT '{}', "started_by_id" uuid, "released_at" TIMESTAMP WITH TIME ZONE, "released_by_id" uuid, "machined_at" TIMESTAMP WITH TIME ZONE, "finish_coats" integer, "finish_coat_interval_h" double precision, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "pours_status_check" CHECK (status IN ('open', 'released', 'machined', 'cancelled')), CONSTRAINT "pours_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "pours_shop_status_idx" ON "pours" ("shop_id", "status") `);
    await queryRunner.query(
      `CREATE TABLE "pour_batches" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "pour_id" uuid NOT NULL, "plan_batch_index" integer NOT NULL, "step" text NOT NULL, "mixed_by_id" uuid, "mixed_at" TIMESTAMP WITH TIME ZONE NOT NULL, "lot_a_id" uuid, "lot_b_id" uuid, "lot_pigment_id" uuid, "lot_a_number" text NOT NULL DEFAULT '', "lot_b_number" text NOT NULL DEFAULT '', "lot_pigment_number" text NOT NULL DEFAULT '', "target_a_g" double precision NOT NULL, "target_b_g" double precision NOT NULL, "target_pigment_g" double precision NOT NULL DEFAULT '0', "weighed_a_g" double precision NOT NULL, "weighed_b_g" double precision NOT NULL, "weighed_pigment_g" double precision NOT NULL DEFAULT '0', "off_ratio_pct" double precision NOT NULL, "ambient_temp_c" double precision, "surface_temp_c" double precision, "rh_pct" double precision, "dew_point_c" double precision, "warnings" jsonb NOT NULL DEFAULT '[]'::jsonb, "notes" text NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "pour_batches_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "pour_batches_pour_index_key" ON "pour_batches" ("pour_id", "plan_batch_index") `);
    await queryRunner.query(`CREATE INDEX "pour_batches_pour_idx" ON "pour_batches" ("pour_id", "mixed_at") `);
    await queryRunner.query(
      `CREATE TABLE "temperature_readings" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "pour_id" uuid NOT NULL, "taken_at" TIMESTAMP WITH TIME ZONE NOT NULL, "temp_c" double precision NOT NULL, "source" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "temperature_readings_source_check" CHECK (source IN ('manual', 'csv', 'sensor')), CONSTRAINT "temperature_readings_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "temperature_readings_pour_time_key" ON "temperature_readings" ("pour_id", "taken_at") `);
    await queryRunner.query(
      `CREATE TABLE "cure_checks" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "pour_id" uuid NOT NULL, "checked_at" TIMESTAMP WITH TIME ZONE NOT NULL, "stage" text NOT NULL, "hardness_shore_d" double precision, "note" text NOT NULL DEFAULT '', "photo_type" text, "photo" bytea, "checked_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "cure_checks_stage_check" CHECK (stage IN ('liquid', 'gelled', 'tack_free', 'demoldable', 'machinable')), CONSTRAINT "cure_checks_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "cure_checks_pour_idx" ON "cure_checks" ("pour_id", "checked_at") `);
    await queryRunner.query(
      `CREATE TABLE "reminders" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "pour_id" uuid NOT NULL, "kind" text NOT NULL, "step" text NOT NULL, "due_at" TIMESTAMP WITH TIME ZONE NOT NULL, "status" text NOT NULL DEFAULT 'pending', "assumed" boolean NOT NULL DEFAULT false, "title" text NOT NULL, "sent_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "reminders_status_check" CHECK (status IN ('pending', 'sent', 'cancelled')), CONSTRAINT "reminders_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "reminders_pour_key" ON "reminders" ("pour_id", "kind", "step") `);
    await queryRunner.query(`CREATE INDEX "reminders_due_idx" ON "reminders" ("status", "due_at") `);
    await queryRunner.query(`ALTER TABLE "shops" ADD "off_ratio_tolerance_pct" double precision NOT NULL DEFAULT '3'`);
    await queryRunner.query(`ALTER TABLE "shops" ADD "ingest_token_hash" text`);
    await queryRunner.query(`ALTER TABLE "audit_events" ALTER COLUMN "detail" SET DEFAULT '{}'::jsonb`);
    await queryRunner.query(
      `ALTER TABLE "pours" ADD CONSTRAINT "pours_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pours" ADD CONSTRAINT "pours_piece_fk" FOREIGN KEY ("piece_id") REFERENCES "pieces"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pours" ADD CONSTRAINT "pours_pour_plan_fk" FOREIGN KEY ("pour_plan_id") REFERENCES "pour_plans"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pours" ADD CONSTRAINT "pours_started_by_fk" FOREIGN KEY ("started_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pours" ADD CONSTRAINT "pours_released_by_fk" FOREIGN KEY ("released_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_batches" ADD CONSTRAINT "pour_batches_pour_fk" FOREIGN KEY ("pour_id") REFERENCES "pours"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_batches" ADD CONSTRAINT "pour_batches_mixed_by_fk" FOREIGN KEY ("mixed_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_batches" ADD CONSTRAINT "pour_batches_lot_a_fk" FOREIGN KEY ("lot_a_id") REFERENCES "lots"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_batches" ADD CONSTRAINT "pour_batches_lot_b_fk" FOREIGN KEY ("lot_b_id") REFERENCES "lots"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_batches" ADD CONSTRAINT "pour_batches_lot_pigment_fk" FOREIGN KEY ("lot_pigment_id") REFERENCES "lots"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "temperature_readings" ADD CONSTRAINT "temperature_readings_pour_fk" FOREIGN KEY ("pour_id") REFERENCES "pours"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "cure_checks" ADD CONSTRAINT "cure_checks_pour_fk" FOREIGN KEY ("pour_id") REFERENCES "pours"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "cure_checks" ADD CONSTRAINT "cure_checks_checked_by_fk" FOREIGN KEY ("checked_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "reminders" ADD CONSTRAINT "reminders_pour_fk" FOREIGN KEY ("pour_id") REFERENCES "pours"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "reminders" DROP CONSTRAINT "reminders_pour_fk"`);
    await queryRunner.query(`ALTER TABLE "cure_checks" DROP CONSTRAINT "cure_checks_checked_by_fk"`);
    await queryRunner.query(`ALTER TABLE "cure_checks" DROP CONSTRAINT "cure_checks_pour_fk"`);
    await queryRunner.query(`ALTER TABLE "temperature_readings" DROP CONSTRAINT "temperature_readings_pour_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP CONSTRAINT "pour_batches_lot_pigment_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP CONSTRAINT "pour_batches_lot_b_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP CONSTRAINT "pour_batches_lot_a_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP CONSTRAINT "pour_batches_mixed_by_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_batches" DROP CONSTRAINT "pour_batches_pour_fk"`);
    await queryRunner.query(`ALTER TABLE "pours" DROP CONSTRAINT "pours_released_by_fk"`);
    await queryRunner.query(`ALTER TABLE "pours" DROP CONSTRAINT "pours_started_by_fk"`);
    await queryRunner.query(`ALTER TABLE "pours" DROP CONSTRAINT "pours_pour_plan_fk"`);
    await queryRunner.query(`ALTER TABLE "pours" DROP CONSTRAINT "pours_piece_fk"`);
    await queryRunner.query(`ALTER TABLE "pours" DROP CONSTRAINT "pours_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "audit_events" ALTER COLUMN "detail" SET DEFAULT '{}'`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "ingest_token_hash"`);
    await queryRunner.query(`ALTER TABLE "shops" DROP COLUMN "off_ratio_tolerance_pct"`);
    await queryRunner.query(`DROP INDEX "public"."reminders_due_idx"`);
    await queryRunner.query(`DROP INDEX "public"."reminders_pour_key"`);
    await queryRunner.query(`DROP TABLE "reminders"`);
    await queryRunner.query(`DROP INDEX "public"."cure_checks_pour_idx"`);
    await queryRunner.query(`DROP TABLE "cure_checks"`);
    await queryRunner.query(`DROP INDEX "public"."temperature_readings_pour_time_key"`);
    await queryRunner.query(`DROP TABLE "temperature_readings"`);
    await queryRunner.query(`DROP INDEX "public"."pour_batches_pour_idx"`);
    await queryRunner.query(`DROP INDEX "public"."pour_batches_pour_index_key"`);
    await queryRunner.query(`DROP TABLE "pour_batches"`);
    await queryRunner.query(`DROP INDEX "public"."pours_shop_status_idx"`);
    await queryRunner.query(`DROP TABLE "pours"`);
  }
}
