import type { MigrationInterface, QueryRunner } from 'typeorm';

export class MouldDepthMapApart1796375915921 implements MigrationInterface {
  name = 'MouldDepthMapApart1796375915921';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "molds" ADD "depth_map" jsonb`);
    await queryRunner.query(
      `UPDATE "molds" SET "depth_map" = "report" -> 'fillToTop' -> 'depthMap', "report" = "report" #- '{fillToTop,depthMap}'
        WHERE "report" -> 'fillToTop' ? 'depthMap'`,
    );
    // pglz spent seconds compressing a 50 MB upload on its way in, and a good part of the write of a finished
    // analysis; lz4 keeps most of the saving at a fraction of the time. A server built without lz4 (or older than
    // PostgreSQL 14) keeps pglz.
    await queryRunner.query(`DO $$
      BEGIN
        ALTER TABLE "mold_files" ALTER COLUMN "bytes" SET COMPRESSION lz4;
        ALTER TABLE "molds" ALTER COLUMN "analysis" SET COMPRESSION lz4, ALTER COLUMN "report" SET COMPRESSION lz4,
          ALTER COLUMN "depth_map" SET COMPRESSION lz4;
      EXCEPTION WHEN feature_not_supported OR syntax_error THEN
        NULL;
      END $$`);
    // Every change of status or progress is announced (at commit) to every API instance, which relays it to the
    // browsers following that mould's analysis.
    await queryRunner.query(`CREATE FUNCTION "molds_progress_notify"() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        PERFORM pg_notify('gelpoint_mold_progress', json_build_object(
          'id', NEW.id, 'status', NEW.status, 'progress', NEW.progress,
          'errorCode', NEW.error_code, 'errorMessage', left(NEW.error_message, 2000))::text);
        RETURN NULL;
      END $$`);
    await queryRunner.query(`CREATE TRIGGER "molds_progress_notify" AFTER UPDATE OF "status", "progress" ON "molds" FOR EACH ROW
      WHEN (OLD."status" IS DISTINCT FROM NEW."status" OR OLD."progress" IS DISTINCT FROM NEW."progress")
      EXECUTE FUNCTION "molds_progress_notify"()`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "molds_progress_notify" ON "molds"`);
    await queryRunner.query(`DROP FUNCTION "molds_progress_notify"()`);
    await queryRunner.query(`DO $$
      BEGIN
        ALTER TABLE "mold_files" ALTER COLUMN "bytes" SET COMPRESSION pglz;
        ALTER TABLE "molds" ALTER COLUMN "analysis" SET COMPRESSION pglz, ALTER COLUMN "report" SET COMPRESSION pglz;
      EXCEPTION WHEN feature_not_supported OR syntax_error THEN
        NULL;
      END $$`);
    await queryRunner.query(
      `UPDATE "molds" SET "report" = jsonb_set("report", '{fillToTop,depthMap}', "depth_map") WHERE "depth_map" IS NOT NULL AND "report" ? 'fillToTop'`,
    );
    await queryRunner.query(`ALTER TABLE "molds" DROP COLUMN "depth_map"`);
  }
}
