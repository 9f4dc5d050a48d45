import { Migration } from '@mikro-orm/migrations';

export class Migration20261202014939 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "quote" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "number" serial, "customer_id" uuid not null, "created_by_id" uuid not null, "vehicle_model_id" uuid not null, "customer_vehicle_id" uuid null, "vehicle_year" smallint null, "uses" jsonb not null, "constant_load_kg" int not null default 0, constraint "quote_pkey" primary key ("id"));`,
    );
    this.addSql(`alter table "quote" add constraint "quote_number_unique" unique ("number");`);
    this.addSql(`create index "quote_customer_id_index" on "quote" ("customer_id");`);

    this.addSql(
      `create table "upload" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "owner_id" uuid not null, "quote_id" uuid null, "kind" text check ("kind" in ('vehicle', 'tyre-placard')) not null, "format" text check ("format" in ('jpeg', 'png', 'webp')) not null, "storage_key" varchar(80) not null, "thumbnail_key" varchar(80) not null, "bytes" int not null, "width_px" int not null, "height_px" int not null, "original_name" varchar(120) not null default '', constraint "upload_pkey" primary key ("id"), constraint upload_bytes_check check (bytes > 0));`,
    );
    this.addSql(`create index "upload_owner_id_index" on "upload" ("owner_id");`);
    this.addSql(`create index "upload_quote_id_index" on "upload" ("quote_id");`);
    this.addSql(
      `alter table "upload" add constraint "upload_storage_key_unique" unique ("storage_key");`,
    );
    this.addSql(
      `alter table "upload" add constraint "upload_thumbnail_key_unique" unique ("thumbnail_key");`,
    );

    this.addSql(
      `create table "quote_version" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "quote_id" uuid not null, "number" smallint not null, "state" text check ("state" in ('draft', 'sent', 'accepted', 'superseded', 'expired', 'declined')) not null, "state_changed_at" timestamptz not null, "revision_reason" text null, "created_by_id" uuid not null, "wheels_fitted" smallint not null, "tyres_replaced" smallint not null, "valid_until_date" varchar(10) not null, "valid_until" timestamptz not null, "total_cents" int not null, "deposit_cents" int not null, "price" jsonb not null, "fit_report" jsonb not null, constraint "quote_version_pkey" primary key ("id"), constraint quote_version_deposit_cents_check check (deposit_cents >= 0), constraint quote_version_total_cents_check check (total_cents >= 0));`,
    );
    this.addSql(
      `alter table "quote_version" add constraint "quote_version_quote_number_unique" unique ("quote_id", "number");`,
    );

    this.addSql(
      `create table "quote_line" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "version_id" uuid not null, "position" smallint not null, "product_id" uuid null, "sku" varchar(40) not null, "name" varchar(120) not null, "brand" varchar(60) not null, "kind" text check ("kind" in ('wheel', 'tyre', 'suspension-kit', 'component', 'service')) not null, "quantity" smallint not null, "unit_price_cents" int not null, "labour_minutes" int not null, "bay_kind" text check ("bay_kind" in ('hoist', 'alignment', 'tyre')) null, "lead_days" int not null, "stock_qty" int not null, "per_wheel" boolean not null, constraint "quote_line_pkey" primary key ("id"), constraint quote_line_unit_price_cents_check check (unit_price_cents >= 0), constraint quote_line_quantity_check check (quantity > 0));`,
    );
    this.addSql(`create index "quote_line_version_id_index" on "quote_line" ("version_id");`);

    this.addSql(
      `create table "workshop" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "name" varchar(120) not null, "address_line" varchar(160) not null, "town" varchar(80) not null, "phone" varchar(40) not null, "email" varchar(254) not null, "time_zone" varchar(64) not null, "currency" varchar(3) not null, "labour_rate_cents_per_hour" int not null, "prices_include_tax" boolean not null, "tax_rate_basis_points" int not null, "tax_rounding_method" text check ("tax_rounding_method" in ('per-invoice', 'per-line')) not null, "fitting_balancing_cents_per_wheel" int not null, "tyre_disposal_cents_per_tyre" int not null, "bundle_discount_enabled" boolean not null, "bundle_discount_basis_points" int not null, "bundle_requires_kinds" jsonb not null, "deposit_basis_points" int not null, "deposit_floor_cents" int not null, "deposit_cap_cents" int not null, "deposit_special_order_basis_points" int not null, "quote_valid_days" int not null, constraint "workshop_pkey" primary key ("id"));`,
    );

    this.addSql(
      `alter table "quote" add constraint "quote_customer_id_foreign" foreign key ("customer_id") references "user" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "quote" add constraint "quote_created_by_id_foreign" foreign key ("created_by_id") references "user" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "quote" add constraint "quote_vehicle_model_id_foreign" foreign key ("vehicle_model_id") references "vehicle_model" ("id") on update cascade on delete restrict;`,
    );
    this.addSql(
      `alter table "quote" add constraint "quote_customer_vehicle_id_foreign" foreign key ("customer_vehicle_id") references "customer_vehicle" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "upload" add constraint "upload_owner_id_foreign" foreign key ("owner_id") references "user" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "upload" add constraint "upload_quote_id_foreign" foreign key ("quote_id") references "quote" ("id") on update cascade on delete set null;`,
    );

    this.addSql(
      `alter table "quote_version" add constraint "quote_version_quote_id_foreign" foreign key ("quote_id") references "quote" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "quote_version" add constraint "quote_version_created_by_id_foreign" foreign key ("created_by_id") references "user" ("id") on update cascade on delete restrict;`,
    );

    this.addSql(
      `alter table "quote_line" add constraint "quote_line_version_id_foreign" foreign key ("version_id") references "quote_version" ("id") on update cascade on delete cascade;`,
    );
    this.addSql(
      `alter table "quote_line" add constraint "quote_line_product_id_foreign" foreign key ("product_id") references "product" ("id") on update cascade on delete set null;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "upload" drop constraint "upload_quote_id_foreign";`);

    this.addSql(`alter table "quote_version" drop constraint "quote_version_quote_id_foreign";`);

    this.addSql(`alter table "quote_line" drop constraint "quote_line_version_id_foreign";`);

    this.addSql(`drop table if exists "quote" cascade;`);

    this.addSql(`drop table if exists "upload" cascade;`);

    this.addSql(`drop table if exists "quote_version" cascade;`);

    this.addSql(`drop table if exists "quote_line" cascade;`);

    this.addSql(`drop table if exists "workshop" cascade;`);
  }
}
