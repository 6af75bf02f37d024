import { Migration } from '@mikro-orm/migrations';

export class Migration20261201233038 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "rock_samples" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "team_id" uuid not null, "name" varchar(160) not null, "site" varchar(200) not null default '', "depth_from_m" double precision null, "depth_to_m" double precision null, "lithology" varchar(200) not null default '', "total_sulfur_percent" double precision null, "sulfide_sulfur_percent" double precision null, "sulfate_sulfur_percent" double precision null, "neutralisation_potential" double precision null, "paste_ph" double precision null, "modes" jsonb not null, "oxides" jsonb null, "notes" text not null default '', constraint "rock_samples_pkey" primary key ("id"));`);
    this.addSql(`create index "rock_samples_team_id_site_index" on "rock_samples" ("team_id", "site");`);
    this.addSql(`alter table "rock_samples" add constraint "rock_samples_team_id_name_unique" unique ("team_id", "name");`);

    this.addSql(`create table "team_settings" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "team_id" uuid not null, "cbe_threshold_percent" double precision not null, "cbe_convention" text check ("cbe_convention" in ('standard', 'half-sum')) not null, "npr_bands" jsonb not null, "ap_sulfur_basis" text check ("ap_sulfur_basis" in ('sulfide', 'total')) not null, "carbonate_pathway" text check ("carbonate_pathway" in ('co2', 'bicarbonate')) not null, constraint "team_settings_pkey" primary key ("id"));`);
    this.addSql(`alter table "team_settings" add constraint "team_settings_team_id_unique" unique ("team_id");`);

    this.addSql(`create table "mineral_formulas" ("id" uuid not null, "created_at" timestamptz not null, "team_id" uuid not null, "species_id" uuid null, "name" varchar(160) not null, "sample_name" varchar(200) not null default '', "analysis" jsonb not null, "basis" varchar(200) not null, "method" varchar(400) not null, "result" jsonb not null, "reaction_id" uuid null, "reaction_set_id" uuid null, "notes" text not null default '', "created_by_id" uuid null, constraint "mineral_formulas_pkey" primary key ("id"));`);
    this.addSql(`create index "mineral_formulas_team_id_created_at_index" on "mineral_formulas" ("team_id", "created_at");`);

    this.addSql(`create table "water_analyses" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "team_id" uuid not null, "name" varchar(160) not null, "site" varchar(200) not null default '', "sampled_on" varchar(10) null, "temperature_c" double precision null, "ph" double precision null, "solutes" jsonb not null, "notes" text not null default '', constraint "water_analyses_pkey" primary key ("id"));`);
    this.addSql(`create index "water_analyses_team_id_site_index" on "water_analyses" ("team_id", "site");`);
    this.addSql(`alter table "water_analyses" add constraint "water_analyses_team_id_name_unique" unique ("team_id", "name");`);

    this.addSql(`create table "mass_balance_models" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version" int not null default 1, "team_id" uuid not null, "name" varchar(200) not null, "description" text not null default '', "initial_water_id" uuid null, "final_water_id" uuid not null, "phases" jsonb not null, "constraints" jsonb not null, "uncertainty" jsonb not null, "result" jsonb not null, constraint "mass_balance_models_pkey" primary key ("id"));`);
    this.addSql(`create index "mass_balance_models_team_id_name_index" on "mass_balance_models" ("team_id", "name");`);

    this.addSql(`alter table "rock_samples" add constraint "rock_samples_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "team_settings" add constraint "team_settings_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "mineral_formulas" add constraint "mineral_formulas_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "mineral_formulas" add constraint "mineral_formulas_species_id_foreign" foreign key ("species_id") references "species" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "mineral_formulas" add constraint "mineral_formulas_reaction_id_foreign" foreign key ("reaction_id") references "reactions" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "mineral_formulas" add constraint "mineral_formulas_reaction_set_id_foreign" foreign key ("reaction_set_id") references "reaction_sets" ("id") on update cascade on delete set null;`);
    this.addSql(`alter table "mineral_formulas" add constraint "mineral_formulas_created_by_id_foreign" foreign key ("created_by_id") references "users" ("id") on update cascade on delete set null;`);

    this.addSql(`alter table "water_analyses" add constraint "water_analyses_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "mass_balance_models" add constraint "mass_balance_models_team_id_foreign" foreign key ("team_id") references "teams" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "mass_balance_models" add constraint "mass_balance_models_initial_water_id_foreign" foreign key ("initial_water_id") references "water_analyses" ("id") on update cascade on delete restrict;`);
    this.addSql(`alter table "mass_balance_models" add constraint "mass_balance_models_final_water_id_foreign" foreign key ("final_water_id") references "water_analyses" ("id") on update cascade on delete restrict;`);

    this.addSql(`alter table "audit_events" drop constraint if exists "audit_events_entity_type_check";`);

    this.addSql(`alter table "audit_events" add constraint "audit_events_entity_type_check" check("entity_type" in ('species', 'reaction_set', 'reaction', 'net_reaction', 'revision', 'publication', 'team_settings', 'water_analysis', 'mass_balance_model', 'rock_sample', 'mineral_formula'));`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "mass_balance_models" drop constraint "mass_balance_models_initial_water_id_foreign";`);

    this.addSql(`alter table "mass_balance_models" drop constraint "mass_balance_models_final_water_id_foreign";`);

    this.addSql(`drop table if exists "rock_samples" cascade;`);

    this.addSql(`drop table if exists "team_settings" cascade;`);

    this.addSql(`drop table if exists "mineral_formulas" cascade;`);

    this.addSql(`drop table if exists "water_analyses" cascade;`);

    this.addSql(`drop table if exists "mass_balance_models" cascade;`);

    this.addSql(`alter table "audit_events" drop constraint if exists "audit_events_entity_type_check";`);

    this.addSql(`alter table "audit_events" add constraint "audit_events_entity_type_check" check("entity_type" in ('species', 'reaction_set', 'reaction', 'net_reaction', 'revision', 'publication'));`);
  }

}
