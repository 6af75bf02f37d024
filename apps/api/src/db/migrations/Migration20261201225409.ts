import { Migration } from '@mikro-orm/migrations';

export class Migration20261201225409 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "species" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "team_id" uuid not null, "name" varchar(160) not null, "formula" varchar(200) not null, "phase" text check ("phase" in ('mineral', 'aqueous', 'gas', 'liquid')) not null, "oxidation_states" jsonb null, "notes" text not null default '', "source" varchar(500) not null default '', "molar_mass" double precision not null, "composition" jsonb not null, "charge" varchar(40) not null, "formula_key" varchar(400) not null, constraint "species_pkey" primary key ("id"));`);
    this.addSql(`alter table "species" add constraint "species_team_id_name_unique" unique ("team_id", "name");`);
    this.addSql(`alter table "species" add constraint "species_team_id_formula_key_unique" unique ("team_id", "formula_key");`);

    this.addSql(`create table "reaction_sets" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "team_id" uuid not null, "name" varchar(200) not null, "description" text not null default '', "site" varchar(200) not null default '', "review_state" text check ("review_state" in ('draft', 'in_review', 'returned', 'vetted')) not null default 'draft', "current_revision" int not null default 0, "created_by_id" uuid null, "updated_by_id" uuid null, "submitted_by_id" uuid null, "copied_from" jsonb null, constraint "reaction_sets_pkey" primary key ("id"));`);
    this.addSql(`create index "reaction_sets_team_id_index" on "reaction_sets" ("team_id");`);

    this.addSql(`create table "revisions" ("id" uuid not null, "created_at" timestamptz not null, "set_id" uuid not null, "number" int not null, "snapshot" jsonb not null, "reaction_count" int not null, "vetted_by_id" uuid null, "vetted_at" timestamptz not null, constraint "revisions_pkey" primary key ("id"));`);
    this.addSql(`alter table "revisions" add constraint "revisions_set_id_number_unique" unique ("set_id", "number");`);

    this.addSql(`create table "review_comments" ("id" uuid not null, "created_at" timestamptz not null, "set_id" uuid not null, "action" text check ("action" in ('submitted', 'returned', 'approved')) not null, "author_id" uuid null, "comment" text not null default '', "revision" int null, constraint "review_comments_pkey" primary key ("id"));`);
    this.addSql(`create index "review_comments_set_id_index" on "review_comments" ("set_id");`);

    this.addSql(`create table "reactions" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "set_id" uuid not null, "position" int not null, "name" varchar(200) not null, "kind" text check ("kind" in ('dissolution', 'alteration', 'oxidation', 'precipitation', 'gas_exchange', 'half_reaction')) not null, "equation" text not null, "reference" varchar(200) null, "citation" text not null default '', "notes" text not null default '', "status" text check ("status" in ('balanced', 'unbalanced', 'open', 'impossible', 'invalid')) not null, "residuals" jsonb not null, "proton_budget" jsonb null, "electron_budget" jsonb null, "balance" jsonb not null, constraint "reactions_pkey" primary key ("id"));`);
    this.addSql(`create index "reactions_set_id_position_index" on "reactions" ("set_id", "position");`);

    this.addSql(`create table "net_reactions" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "set_id" uuid not null, "position" int not null, "name" varchar(200) not null, "members" jsonb not null, "cancel" jsonb not null, "status" text check ("status" in ('combined', 'none', 'several', 'invalid')) not null, "result" jsonb not null, constraint "net_reactions_pkey" primary key ("id"));`);
    this.addSql(`create index "net_reactions_set_id_index" on "net_reactions" ("set_id");`);

    this.addSql(`create table "publications" ("id" uuid not null, "created_at" timestamptz not null, "team_id" uuid not null, "revision_id" uuid not null, "published_by_id" uuid null, constraint "publications_pkey" primary key ("id"));`);
    this.addSql(`create index "publications_team_id_index" on "publications" ("team_id");`);
    this.addSql(`alter table "publications" add constraint "publications_revision_id_unique" unique ("revision_id");`);

    this.addSql(`create table "audit_events" ("id" uuid not null, "created_at" timestamptz not null, "team_id" uuid not null, "actor_id" uuid null, "action" varchar(60) not null, "entity_type" text check ("entity_type" in ('species', 'reaction_set', 'reaction', 'net_reaction', 'revision', 'publication')) not null, "entity_id" varchar(60) not null, "summary" varchar(400) not null, constraint "audit_events_pkey" primary key ("id"));`);
    this.addSql(`create index "audit_events_team_id_created_at_index" on "audit_events" ("team_id", "created_at");`);

    this.addSql(`alter table "species" add constraint "species_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "reaction_sets" add constraint "reaction_sets_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "reaction_sets" add constraint "reaction_sets_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "reaction_sets" add constraint "reaction_sets_updated_by_id_foreign" foreign key ("updated_by_id") references "users" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "reaction_sets" add constraint "reaction_sets_submitted_by_id_foreign" foreign key ("submitted_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "revisions" add constraint "revisions_set_id_foreign" foreign key ("set_id") references "reaction_sets" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "revisions" add constraint "revisions_vetted_by_id_foreign" foreign key ("vetted_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "review_comments" add constraint "review_comments_set_id_foreign" foreign key ("set_id") references "reaction_sets" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "review_comments" add constraint "review_comments_author_id_foreign" foreign key ("author_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "reactions" add constraint "reactions_set_id_foreign" foreign key ("set_id") references "reaction_sets" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "net_reactions" add constraint "net_reactions_set_id_foreign" foreign key ("set_id") references "reaction_sets" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "publications" add constraint "publications_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "publications" add constraint "publications_revision_id_foreign" foreign key ("revision_id") references "revisions" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "publications" add constraint "publications_published_by_id_foreign" foreign key ("published_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "audit_events" add constraint "audit_events_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "audit_events" add constraint "audit_events_actor_id_foreign" foreign key ("actor_id") references "users" ("id") on update cascade on delete set null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "revisions" drop constraint "revisions_set_id_foreign";`);

    this.addSql(`alter table "review_comments" drop constraint "review_comments_set_id_foreign";`);

    this.addSql(`alter table "reactions" drop constraint "reactions_set_id_foreign";`);

    this.addSql(`alter table "net_reactions" drop constraint "net_reactions_set_id_foreign";`);

    this.addSql(`alter table "publications" drop constraint "publications_revision_id_foreign";`);

    this.addSql(`drop table if exists "species" cascade;`);

    this.addSql(`drop table if exists "reaction_sets" cascade;`);

    this.addSql(`drop table if exists "revisions" cascade;`);

    this.addSql(`drop table if exists "review_comments" cascade;`);

    this.addSql(`drop table if exists "reactions" cascade;`);

    this.addSql(`drop table if exists "net_reactions" cascade;`);

    this.addSql(`drop table if exists "publications" cascade;`);

    this.addSql(`drop table if exists "audit_events" cascade;`);
  }

}
