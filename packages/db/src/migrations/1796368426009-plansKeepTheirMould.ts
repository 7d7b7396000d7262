import type { MigrationInterface, QueryRunner } from 'typeorm';

// A plan's mould can no longer vanish under it: the foreign key stops deleting a mould that a plan still names
// (checked at the end of the statement, so a shop deleted with its moulds and plans still goes in one go).
export class PlansKeepTheirMould1796368426009 implements MigrationInterface {
  name = 'PlansKeepTheirMould1796368426009';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "pour_plans" DROP CONSTRAINT "pour_plans_mold_fk"`);
    await queryRunner.query(
      `ALTER TABLE "pour_plans" ADD CONSTRAINT "pour_plans_mold_fk" FOREIGN KEY ("mold_id") REFERENCES "molds"("id") ON DELETE NO ACTION ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "pour_plans" DROP CONSTRAINT "pour_plans_mold_fk"`);
    await queryRunner.query(
      `ALTER TABLE "pour_plans" ADD CONSTRAINT "pour_plans_mold_fk" FOREIGN KEY ("mold_id") REFERENCES "molds"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
  }
}
