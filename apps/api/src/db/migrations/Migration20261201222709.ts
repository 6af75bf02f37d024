import { Migration } from '@mikro-orm/migrations';

export class Migration20261201222709 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "revoked_tokens" ("jti" uuid not null, "expires_at" timestamptz not null, constraint "revoked_tokens_pkey" primary key ("jti"));`);
    this.addSql(`create index "revoked_tokens_expires_at_index" on "revoked_tokens" ("expires_at");`);

    this.addSql(`create table "teams" ("id" uuid not null, "created_at" timestamptz not null, "name" varchar(120) not null, constraint "teams_pkey" primary key ("id"));`);

    this.addSql(`create table "users" ("id" uuid not null, "created_at" timestamptz not null, "email" varchar(254) not null, "display_name" varchar(80) not null, "password_hash" varchar(72) not null, constraint "users_pkey" primary key ("id"));`);
    this.addSql(`alter table "users" add constraint "users_email_unique" unique ("email");`);

    this.addSql(`create table "memberships" ("id" uuid not null, "created_at" timestamptz not null, "team_id" uuid not null, "user_id" uuid not null, "role" text check ("role" in ('owner', 'reviewer', 'editor', 'viewer')) not null, constraint "memberships_pkey" primary key ("id"));`);
    this.addSql(`create index "memberships_user_id_index" on "memberships" ("user_id");`);
    this.addSql(`alter table "memberships" add constraint "memberships_team_id_user_id_unique" unique ("team_id", "user_id");`);

    this.addSql(`create table "invitations" ("id" uuid not null, "created_at" timestamptz not null, "team_id" uuid not null, "email" varchar(254) not null, "role" text check ("role" in ('owner', 'reviewer', 'editor', 'viewer')) not null, "token_hash" varchar(64) not null, "invited_by_id" uuid not null, "expires_at" timestamptz not null, "accepted_at" timestamptz null, "accepted_by_id" uuid null, constraint "invitations_pkey" primary key ("id"));`);
    this.addSql(`create index "invitations_team_id_index" on "invitations" ("team_id");`);
    this.addSql(`alter table "invitations" add constraint "invitations_token_hash_unique" unique ("token_hash");`);

    this.addSql(`alter table "memberships" add constraint "memberships_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "memberships" add constraint "memberships_user_id_foreign" foreign key ("user_id") references "users" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "invitations" add constraint "invitations_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "invitations" add constraint "invitations_invited_by_id_foreign" foreign key ("invited_by_id") references "users" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "invitations" add constraint "invitations_accepted_by_id_foreign" foreign key ("accepted_by_id") references "users" ("id") on update cascade on delete set null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "memberships" drop constraint "memberships_team_id_foreign";`);

    this.addSql(`alter table "invitations" drop constraint "invitations_team_id_foreign";`);

    this.addSql(`alter table "memberships" drop constraint "memberships_user_id_foreign";`);

    this.addSql(`alter table "invitations" drop constraint "invitations_invited_by_id_foreign";`);

    this.addSql(`alter table "invitations" drop constraint "invitations_accepted_by_id_foreign";`);

    this.addSql(`drop table if exists "revoked_tokens" cascade;`);

    this.addSql(`drop table if exists "teams" cascade;`);

    this.addSql(`drop table if exists "users" cascade;`);

    this.addSql(`drop table if exists "memberships" cascade;`);

    this.addSql(`drop table if exists "invitations" cascade;`);
  }

}
