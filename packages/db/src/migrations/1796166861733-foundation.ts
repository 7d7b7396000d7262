import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1796166861733 implements MigrationInterface {
  name = 'Foundation1796166861733';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "audit_events" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid, "actor_user_id" uuid, "actor_name" text, "action" text NOT NULL, "object_type" text NOT NULL, "object_id" text, "detail" jsonb NOT NULL DEFAULT '{}'::jsonb, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "audit_events_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "audit_events_object_idx" ON "audit_events" ("object_type", "object_id") `);
    await queryRunner.query(`CREATE INDEX "audit_events_shop_created_idx" ON "audit_events" ("shop_id", "created_at") `);
    await queryRunner.query(
      `CREATE TABLE "shops" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" text NOT NULL, "unit_system" text NOT NULL DEFAULT 'metric', "scale_resolution_g" double precision NOT NULL DEFAULT '0.1', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "shops_scale_resolution_check" CHECK (scale_resolution_g IN (0.1, 1)), CONSTRAINT "shops_unit_system_check" CHECK (unit_system IN ('metric', 'us')), CONSTRAINT "shops_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "users" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "email" text NOT NULL, "name" text NOT NULL, "password_hash" text NOT NULL, "password_changed_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "users_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "users_email_key" ON "users" ("email") `);
    await queryRunner.query(
      `CREATE TABLE "invitations" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "token_hash" text NOT NULL, "invited_by_id" uuid, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "accepted_at" TIMESTAMP WITH TIME ZONE, "revoked_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "invitations_role_check" CHECK (role IN ('lead', 'maker', 'apprentice')), CONSTRAINT "invitations_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "invitations_shop_idx" ON "invitations" ("shop_id") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "invitations_token_hash_key" ON "invitations" ("token_hash") `);
    await queryRunner.query(
      `CREATE TABLE "memberships" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "shop_id" uuid NOT NULL, "role" text NOT NULL, "status" text NOT NULL DEFAULT 'active', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "memberships_status_check" CHECK (status IN ('active', 'disabled')), CONSTRAINT "memberships_role_check" CHECK (role IN ('lead', 'maker', 'apprentice')), CONSTRAINT "memberships_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "memberships_shop_idx" ON "memberships" ("shop_id") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "memberships_user_shop_key" ON "memberships" ("user_id", "shop_id") `);
    await queryRunner.query(
      `CREATE TABLE "outbound_mail" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid, "dedupe_key" text NOT NULL, "message_id" text NOT NULL, "to_address" text NOT NULL, "subject" text NOT NULL, "body_text" text NOT NULL, "body_html" text, "status" text NOT NULL DEFAULT 'pending', "attempts" integer NOT NULL DEFAULT '0', "next_attempt_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "locked_until" TIMESTAMP WITH TIME ZONE, "last_error" text, "sent_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "outbound_mail_status_check" CHECK (status IN ('pending', 'sending', 'sent', 'failed')), CONSTRAINT "outbound_mail_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE UNIQUE INDEX "outbound_mail_dedupe_key" ON "outbound_mail" ("dedupe_key") `);
    await queryRunner.query(`CREATE INDEX "outbound_mail_due_idx" ON "outbound_mail" ("status", "next_attempt_at") `);
    await queryRunner.query(
      `CREATE TABLE "password_resets" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "token_hash" text NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "used_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "password_resets_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "password_resets_user_idx" ON "password_resets" ("user_id") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "password_resets_token_hash_key" ON "password_resets" ("token_hash") `);
    await queryRunner.query(
      `CREATE TABLE "pieces" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "shop_id" uuid NOT NULL, "name" text NOT NULL, "wood" text NOT NULL DEFAULT '', "notes" text NOT NULL DEFAULT '', "stage" text NOT NULL DEFAULT 'planning', "created_by_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "pieces_stage_check" CHECK (stage IN ('planning', 'pouring', 'curing', 'ready', 'released', 'finishing', 'done')), CONSTRAINT "pieces_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "pieces_shop_updated_idx" ON "pieces" ("shop_id", "updated_at") `);
    await queryRunner.query(
      `CREATE TABLE "sessions" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "user_id" uuid NOT NULL, "shop_id" uuid NOT NULL, "expires_at" TIMESTAMP WITH TIME ZONE NOT NULL, "revoked_at" TIMESTAMP WITH TIME ZONE, "user_agent" text NOT NULL DEFAULT '', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "sessions_pkey" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "sessions_user_idx" ON "sessions" ("user_id") `);
    await queryRunner.query(
      `ALTER TABLE "invitations" ADD CONSTRAINT "invitations_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "invitations" ADD CONSTRAINT "invitations_invited_by_fk" FOREIGN KEY ("invited_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "memberships" ADD CONSTRAINT "memberships_user_fk" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "memberships" ADD CONSTRAINT "memberships_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "password_resets" ADD CONSTRAINT "password_resets_user_fk" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pieces" ADD CONSTRAINT "pieces_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "pieces" ADD CONSTRAINT "pieces_created_by_fk" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "sessions" ADD CONSTRAINT "sessions_user_fk" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "sessions" ADD CONSTRAINT "sessions_shop_fk" FOREIGN KEY ("shop_id") REFERENCES "shops"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "sessions_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "sessions_user_fk"`);
    await queryRunner.query(`ALTER TABLE "pieces" DROP CONSTRAINT "pieces_created_by_fk"`);
    await queryRunner.query(`ALTER TABLE "pieces" DROP CONSTRAINT "pieces_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "password_resets" DROP CONSTRAINT "password_resets_user_fk"`);
    await queryRunner.query(`ALTER TABLE "memberships" DROP CONSTRAINT "memberships_shop_fk"`);
    await queryRunner.query(`ALTER TABLE "memberships" DROP CONSTRAINT "memberships_user_fk"`);
    await queryRunner.query(`ALTER TABLE "invitations" DROP CONSTRAINT "invitations_invited_by_fk"`);
    await queryRunner.query(`ALTER TABLE "invitations" DROP CONSTRAINT "invitations_shop_fk"`);
    await queryRunner.query(`DROP INDEX "public"."sessions_user_idx"`);
    await queryRunner.query(`DROP TABLE "sessions"`);
    await queryRunner.query(`DROP INDEX "public"."pieces_shop_updated_idx"`);
    await queryRunner.query(`DROP TABLE "pieces"`);
    await queryRunner.query(`DROP INDEX "public"."password_resets_token_hash_key"`);
    await queryRunner.query(`DROP INDEX "public"."password_resets_user_idx"`);
    await queryRunner.query(`DROP TABLE "password_resets"`);
    await queryRunner.query(`DROP INDEX "public"."outbound_mail_due_idx"`);
    await queryRunner.query(`DROP INDEX "public"."outbound_mail_dedupe_key"`);
    await queryRunner.query(`DROP TABLE "outbound_mail"`);
    await queryRunner.query(`DROP INDEX "public"."memberships_user_shop_key"`);
    await queryRunner.query(`DROP INDEX "public"."memberships_shop_idx"`);
    await queryRunner.query(`DROP TABLE "memberships"`);
    await queryRunner.query(`DROP INDEX "public"."invitations_token_hash_key"`);
    await queryRunner.query(`DROP INDEX "public"."invitations_shop_idx"`);
    await queryRunner.query(`DROP TABLE "invitations"`);
    await queryRunner.query(`DROP INDEX "public"."users_email_key"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`DROP TABLE "shops"`);
    await queryRunner.query(`DROP INDEX "public"."audit_events_shop_created_idx"`);
    await queryRunner.query(`DROP INDEX "public"."audit_events_object_idx"`);
    await queryRunner.query(`DROP TABLE "audit_events"`);
  }
}
