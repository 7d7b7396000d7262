import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ExothermSettings1796375729058 implements MigrationInterface {
  name = 'ExothermSettings1796375729058';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "resin_systems" ADD "reaction_heat_j_per_g" double precision`);
    await queryRunner.query(`ALTER TABLE "resin_systems" ADD "thin_film_gel_min" double precision`);
    await queryRunner.query(`ALTER TABLE "resin_systems" ADD "heat_capacity_j_per_gk" double precision`);
    await queryRunner.query(`ALTER TABLE "resin_systems" ADD "conductivity_w_per_mk" double precision`);
    await queryRunner.query(`ALTER TABLE "resin_systems" ADD "accepted_peak_c" double precision`);
    await queryRunner.query(
      `ALTER TABLE "resin_systems" ADD CONSTRAINT "resin_systems_exotherm_check" CHECK ((reaction_heat_j_per_g IS NULL OR reaction_heat_j_per_g > 0) AND (thin_film_gel_min IS NULL OR thin_film_gel_min > 0) AND (heat_capacity_j_per_gk IS NULL OR heat_capacity_j_per_gk > 0) AND (conductivity_w_per_mk IS NULL OR conductivity_w_per_mk > 0) AND (accepted_peak_c IS NULL OR accepted_peak_c > reference_temp_c))`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP CONSTRAINT "resin_systems_exotherm_check"`);
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP COLUMN "accepted_peak_c"`);
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP COLUMN "conductivity_w_per_mk"`);
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP COLUMN "heat_capacity_j_per_gk"`);
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP COLUMN "thin_film_gel_min"`);
    await queryRunner.query(`ALTER TABLE "resin_systems" DROP COLUMN "reaction_heat_j_per_g"`);
  }
}
