import { Migration } from '@mikro-orm/migrations';

/**
 * The catalogue and the fit report's data: vehicle models (spec sheets), customers' vehicles,
 * products with per-kind attributes (jsonb) and the vehicles they are made for, and rule sets
 * (limits as jsonb; at most one default, by a partial unique index).
 */
export class Migration20261201225254 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "product" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "sku" varchar(40) not null, "kind" text check ("kind" in ('wheel', 'tyre', 'suspension-kit', 'component', 'service')) not null, "name" varchar(120) not null, "brand" varchar(60) not null, "description" text not null default '', "price_cents" int not null, "labour_minutes" int not null, "bay_kind" text check ("bay_kind" in ('hoist', 'alignment', 'tyre')) null, "stock_qty" int not null, "lead_days" int not null, "active" boolean not null, "attributes" jsonb not null, constraint "product_pkey" primary key ("id"), constraint product_lead_days_check check (lead_days >= 0), constraint product_stock_qty_check check (stock_qty >= 0), constraint product_labour_minutes_check check (labour_minutes >= 0), constraint product_price_cents_check check (price_cents >= 0));`,
    );
    this.addSql(`alter table "product" add constraint "product_sku_unique" unique ("sku");`);
    this.addSql(`create index "product_kind_index" on "product" ("kind");`);

    this.addSql(
      `create table "rule_set" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "name" varchar(80) not null, "jurisdiction" varchar(120) not null, "description" text not null default '', "is_default" boolean not null default false, "limits" jsonb not null, constraint "rule_set_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "rule_set" add constraint "rule_set_name_unique" unique ("name");`);
    this.addSql(
      `create unique index "rule_set_single_default_index" on "rule_set" ("is_default") where "is_default";`,
    );

    this.addSql(
      `create table "vehicle_model" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "make" varchar(60) not null, "model" varchar(60) not null, "variant" varchar(80) not null, "year_from" smallint not null, "year_to" smallint not null, "body_type" text check ("body_type" in ('ute', 'wagon')) not null, "front_suspension" text check ("front_suspension" in ('independent', 'solid-axle')) not null, "rear_suspension" text check ("rear_suspension" in ('leaf', 'coil', 'independent')) not null, "bolt_pattern" varchar(12) not null, "stud_thread" varchar(12) not null, "centre_bore_mm" numeric(5,2) not null, "stock_tyre" varchar(40) not null, "largest_specified_tyre" varchar(40) null, "stock_wheel_diameter_in" numeric(4,1) not null, "stock_wheel_width_in" numeric(4,1) not null, "stock_wheel_offset_mm" int not null, "gvm_kg" int not null, "front_axle_kg" int not null, "rear_axle_kg" int not null, "kerb_mass_kg" int not null, "placard_load_index" smallint not null, "placard_speed_symbol" varchar(1) not null, "front_half_shaft_length_mm" int null, "off_road_category" boolean not null, "top_speed_kmh" smallint null, constraint "vehicle_model_pkey" primary key ("id"), constraint vehicle_model_masses_check check (gvm_kg > kerb_mass_kg), constraint vehicle_model_years_check check (year_to >= year_from));`,
    );
    this.addSql(
      `alter table "vehicle_model" add constraint "vehicle_model_make_model_variant_unique" unique ("make", "model", "variant");`,
    );

    this.addSql(
      `create table "product_fits_vehicle_model" ("product_id" uuid not null, "vehicle_model_id" uuid not null, constraint "product_fits_vehicle_model_pkey" primary key ("product_id", "vehicle_model_id"));`,
    );

    this.addSql(
      `create table "customer_vehicle" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "owner_id" uuid not null, "vehicle_model_id" uuid not null, "nickname" varchar(60) null, "rego" varchar(12) null, "year" smallint null, constraint "customer_vehicle_pkey" primary key ("id"));`,
    );
    this.addSql(
      `create index "customer_vehicle_owner_id_index" on "customer_vehicle" ("owner_id");`,
    );

    this.addSql(
      `alter table "product_fits_vehicle_model" add constraint "product_fits_vehicle_model_product_id_foreign" foreign key ("product_id") references "product" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "product_fits_vehicle_model" add constraint "product_fits_vehicle_model_vehicle_model_id_foreign" foreign key ("vehicle_model_id") references "vehicle_model" ("id") on update cascade on delete cascade;`,
    );

    this.addSql(
      `alter table "customer_vehicle" add constraint "customer_vehicle_owner_id_foreign" foreign key ("owner_id") references "user" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "customer_vehicle" add constraint "customer_vehicle_vehicle_model_id_foreign" foreign key ("vehicle_model_id") references "vehicle_model" ("id") on update cascade on delete restrict;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(
      `alter table "product_fits_vehicle_model" drop constraint "product_fits_vehicle_model_product_id_foreign";`,
    );

    this.addSql(
      `alter table "product_fits_vehicle_model" drop constraint "product_fits_vehicle_model_vehicle_model_id_foreign";`,
    );

    this.addSql(
      `alter table "customer_vehicle" drop constraint "customer_vehicle_vehicle_model_id_foreign";`,
    );

    this.addSql(`drop table if exists "product" cascade;`);

    this.addSql(`drop table if exists "rule_set" cascade;`);

    this.addSql(`drop table if exists "vehicle_model" cascade;`);

    this.addSql(`drop table if exists "product_fits_vehicle_model" cascade;`);

    this.addSql(`drop table if exists "customer_vehicle" cascade;`);
  }
}
