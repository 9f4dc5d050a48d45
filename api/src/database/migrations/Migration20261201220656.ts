import { Migration } from '@mikro-orm/migrations';

/**
 * Accounts, password reset tokens, and the tables of two libraries: express-session rows for
 * connect-pg-simple ("session", its table.sql layout) and rate-limiter-flexible counters
 * ("auth_throttle").
 */
export class Migration20261201220656 extends Migration {
  override async up(): Promise<void> {
    this.addSql(
      `create table "auth_throttle" ("key" varchar(255) not null, "points" int not null default 0, "expire" bigint null, constraint "auth_throttle_pkey" primary key ("key"));`,
    );

    this.addSql(
      `create table "session" ("sid" varchar not null, "sess" json not null, "expire" timestamp(6) not null, constraint "session_pkey" primary key ("sid"));`,
    );
    this.addSql(`create index "IDX_session_expire" on "session" ("expire");`);

    this.addSql(
      `create table "user" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "email" varchar(254) not null, "name" varchar(100) not null, "role" text check ("role" in ('customer', 'desk', 'tech', 'manager')) not null, "password_hash" text not null, "active" boolean not null default true, constraint "user_pkey" primary key ("id"), constraint user_email_lower_case_check check (email = lower(email)));`,
    );
    this.addSql(`alter table "user" add constraint "user_email_unique" unique ("email");`);

    this.addSql(
      `create table "password_reset_token" ("id" uuid not null, "created_at" timestamptz not null, "updated_at" timestamptz not null, "user_id" uuid not null, "token_hash" varchar(64) not null, "expires_at" timestamptz not null, "used_at" timestamptz null, constraint "password_reset_token_pkey" primary key ("id"));`,
    );
    this.addSql(
      `create index "password_reset_token_user_id_index" on "password_reset_token" ("user_id");`,
    );
    this.addSql(
      `alter table "password_reset_token" add constraint "password_reset_token_token_hash_unique" unique ("token_hash");`,
    );

    this.addSql(
      `alter table "password_reset_token" add constraint "password_reset_token_user_id_foreign" foreign key ("user_id") references "user" ("id") on update cascade on delete cascade;`,
    );
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "password_reset_token" cascade;`);
    this.addSql(`drop table if exists "user" cascade;`);
    this.addSql(`drop table if exists "session" cascade;`);
    this.addSql(`drop table if exists "auth_throttle" cascade;`);
  }
}
