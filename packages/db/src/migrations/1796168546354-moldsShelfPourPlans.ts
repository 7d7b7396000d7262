import type { MigrationInterface, QueryRunner } from 'typeorm';

export class MoldsShelfPourPlans1796168546354 implements MigrationInterface {
  name = 'MoldsShelfPourPlans1796168546354';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "molds" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "piece_id" uuid, "name" text NOT NULL, "file_name" text NOT NULL, "units" text NOT NULL, "up_axis" text NOT NULL, "size_bytes" integer NOT NULL, "sha256" text NOT NULL, "status" text NOT NULL DEFAULT 'queued', "progress" double precision NOT NULL DEFAULT '0', "attempts" integer NOT NULL DEFAULT '0', "locked_until" TIMESTAMP WITH TIME ZONE, "error_code" text, "error_message" text, "triangle_count" integer, "report" jsonb, "analysis" jsonb, "analysed_at" TIMESTAMP WITH TIME ZONE, "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "molds_up_axis_check" CHECK (up_axis IN ('x', 'y', 'z')), CONSTRAINT "molds_units_check" CHECK (units IN ('mm', 'cm', 'in')), CONSTRAINT "molds_status_check" CHECK (status IN ('queued', 'analysing', 'ready', 'failed')), CONSTRAINT "molds_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "molds_due_idx" ON "molds" ("status", "locked_until") `);
    await queryRunner.query(`CREATE INDEX "molds_shop_created_idx" ON "molds" ("shop_id", "created_at") `);
    await queryRunner.query(
      `CREATE TABLE "mold_files" ("mold_id" uuid NOT NULL, "bytes" bytea NOT NULL, CONSTRAINT "mold_files_pkey" PRIMARY KEY ("mold_id"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "resin_systems" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "name" text NOT NULL, "maker" text NOT NULL DEFAULT '', "use" text NOT NULL, "ratio_a" double precision NOT NULL, "ratio_b" double precision NOT NULL, "ratio_basis" text NOT NULL, "density_a_g_per_ml" double precision NOT NULL, "density_b_g_per_ml" double precision NOT NULL, "pot_life_min" double precision NOT NULL, "gel_time_h" double precision NOT NULL, "tack_free_h" double precision NOT NULL, "recoat_earliest_h" double precision NOT NULL, "recoat_latest_h" double precision NOT NULL, "demold_h" double precision NOT NULL, "full_cure_h" double precision NOT NULL, "ready_to_machine_h" double precision, "reference_temp_c" double precision NOT NULL, "min_work_temp_c" double precision NOT NULL, "max_work_temp_c" double precision NOT NULL, "max_layer_mm" double precision NOT NULL, "max_batch_g" double precision NOT NULL, "activation_energy_kj_per_mol" double precision, "price_per_kit" double precision NOT NULL, "kit_size_g" double precision NOT NULL, "shelf_life_months" double precision NOT NULL, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "resin_systems_ratio_basis_check" CHECK (ratio_basis IN ('weight', 'volume')), CONSTRAINT "resin_systems_use_check" CHECK (use IN ('seal', 'deep_pour', 'casting', 'coating')), CONSTRAINT "resin_systems_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "resin_systems_shop_name_idx" ON "resin_systems" ("shop_id", "name") `);
    await queryRunner.query(
      `CREATE TABLE "pigments" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "name" text NOT NULL, "kind" text NOT NULL, "recommended_pct" double precision NOT NULL, "max_pct" double precision NOT NULL, "price_per_pack" double precision NOT NULL, "pack_size_g" double precision NOT NULL, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "pigments_kind_check" CHECK (kind IN ('powder', 'paste', 'liquid')), CONSTRAINT "pigments_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "pigments_shop_name_idx" ON "pigments" ("shop_id", "name") `);
    await queryRunner.query(
      `CREATE TABLE "lots" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "part" text NOT NULL, "resin_system_id" uuid, "pigment_id" uuid, "lot_number" text NOT NULL, "quantity_g" double precision NOT NULL, "remaining_g" double precision NOT NULL, "received_on" date NOT NULL, "expires_on" date, "notes" text NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "lots_quantity_check" CHECK (quantity_g > 0), CONSTRAINT "lots_product_check" CHECK ((part = 'pigment' AND pigment_id IS NOT NULL AND resin_system_id IS NULL) OR (part IN ('A', 'B') AND resin_system_id IS NOT NULL AND pigment_id IS NULL)), CONSTRAINT "lots_part_check" CHECK (part IN ('A', 'B', 'pigment')), CONSTRAINT "lots_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "lots_shop_number_idx" ON "lots" ("shop_id", "lot_number") `);
    await queryRunner.query(`CREATE INDEX "lots_shop_expires_idx" ON "lots" ("shop_id", "expires_on") `);
    await queryRunner.query(
      `CREATE TABLE "pour_plans" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "piece_id" uuid NOT NULL, "mold_id" uuid, "name" text NOT NULL, "inputs" jsonb NOT NULL, "product_snapshot" jsonb NOT NULL, "result" jsonb NOT NULL, "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "pour_plans_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "pour_plans_shop_piece_idx" ON "pour_plans" ("shop_id", "piece_id") `);
    await queryRunner.query(`ALTER TABLE "audit_events" ALTER COLUMN "detail" SET DEFAULT '{}'::jsonb`);
    await queryRunner.query(
      `ALTER TABLE "molds" ADD CONSTRAINT "molds_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "molds" ADD CONSTRAINT "molds_piece_fk" FOREIGN KEY ("piece_id") REFERENCES "pieces"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "molds" ADD CONSTRAINT "molds_created_by_fk" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "mold_files" ADD CONSTRAINT "mold_files_mold_fk" FOREIGN KEY ("mold_id") REFERENCES "molds"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "resin_systems" ADD CONSTRAINT "resin_systems_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pigments" ADD CONSTRAINT "pigments_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "lots" ADD CONSTRAINT "lots_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "lots" ADD CONSTRAINT "lots_resin_system_fk" FOREIGN KEY ("resin_system_id") REFERENCES "resin_systems"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "lots" ADD CONSTRAINT "lots_pigment_fk" FOREIGN KEY ("pigment_id") REFERENCES "pigments"("id") ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_plans" ADD CONSTRAINT "pour_plans_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_plans" ADD CONSTRAINT "pour_plans_piece_fk" FOREIGN KEY ("piece_id") REFERENCES "pieces"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_plans" ADD CONSTRAINT "pour_plans_mold_fk" FOREIGN KEY ("mold_id") REFERENCES "molds"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pour_plans" ADD CONSTRAINT "pour_plans_created_by_fk" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "pour_plans" DROP CONSTRAINT "pour_plans_created_by_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_plans" DROP CONSTRAINT "pour_plans_mold_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_plans" DROP CONSTRAINT "pour_plans_piece_fk"`);
    await queryRunner.query(`ALTER TABLE "pour_plans" DROP CONSTRAINT "pour_plans_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "lots" DROP CONSTRAINT "lots_pigment_fk"`);
    await queryRunner.query(`ALTER TABLE "lots" DROP CONSTRAINT "lots_resin_system_fk"`);
    await queryRunner.query(`ALTER TABLE "lots" DROP CONSTRAINT "lots_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "pigments" DROP CONSTRAINT "pigments_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP CONSTRAINT "resin_systems_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "mold_files" DROP CONSTRAINT "mold_files_mold_fk"`);
    await queryRunner.query(`ALTER TABLE "molds" DROP CONSTRAINT "molds_created_by_fk"`);
    await queryRunner.query(`ALTER TABLE "molds" DROP CONSTRAINT "molds_piece_fk"`);
    await queryRunner.query(`ALTER TABLE "molds" DROP CONSTRAINT "molds_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "audit_events" ALTER COLUMN "detail" SET DEFAULT '{}'`);
    await queryRunner.query(`DROP INDEX "public"."pour_plans_shop_piece_idx"`);
    await queryRunner.query(`DROP TABLE "pour_plans"`);
    await queryRunner.query(`DROP INDEX "public"."lots_shop_expires_idx"`);
    await queryRunner.query(`DROP INDEX "public"."lots_shop_number_idx"`);
    await queryRunner.query(`DROP TABLE "lots"`);
    await queryRunner.query(`DROP INDEX "public"."pigments_shop_name_idx"`);
    await queryRunner.query(`DROP TABLE "pigments"`);
    await queryRunner.query(`DROP INDEX "public"."resin_systems_shop_name_idx"`);
    await queryRunner.query(`DROP TABLE "resin_systems"`);
    await queryRunner.query(`DROP TABLE "mold_files"`);
    await queryRunner.query(`DROP INDEX "public"."molds_shop_created_idx"`);
    await queryRunner.query(`DROP INDEX "public"."molds_due_idx"`);
    await queryRunner.query(`DROP TABLE "molds"`);
  }
}
