import { Migration } from '@mikro-orm/migrations';

export class Migration20261201232851 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "login_attempt" ("id" uuid not null, "created_at" timestamptz not null, "key" varchar(300) not null, constraint "login_attempt_pkey" primary key ("id"));`);
    this.addSql(`create index "login_attempt_key_created_at_index" on "login_attempt" ("key", "created_at");`);

    this.addSql(`create table "app_user" ("id" uuid not null, "created_at" timestamptz not null, "email" varchar(254) not null, "name" varchar(100) not null, "password_hash" varchar(100) not null, "role" varchar(16) not null default 'member', "email_verified_at" timestamptz null, "updated_at" timestamptz not null, constraint "app_user_pkey" primary key ("id"));`);
    this.addSql(`alter table "app_user" add constraint "app_user_email_unique" unique ("email");`);

    this.addSql(`create table "rule_preset" ("id" uuid not null, "created_at" timestamptz not null, "owner_id" uuid not null, "name" varchar(120) not null, "description" text not null default '', "numbers" jsonb not null, "published" boolean not null default false, "updated_at" timestamptz not null, constraint "rule_preset_pkey" primary key ("id"));`);

    this.addSql(`create table "price_list" ("id" uuid not null, "created_at" timestamptz not null, "owner_id" uuid not null, "items" jsonb not null, "currency" varchar(3) not null default 'USD', "updated_at" timestamptz not null, constraint "price_list_pkey" primary key ("id"));`);
    this.addSql(`alter table "price_list" add constraint "price_list_owner_id_unique" unique ("owner_id");`);

    this.addSql(`create table "plan" ("id" uuid not null, "created_at" timestamptz not null, "owner_id" uuid not null, "name" varchar(120) not null, "units" varchar(8) not null default 'in', "document" jsonb not null, "version" int not null default 1, "updated_at" timestamptz not null, "deleted_at" timestamptz null, "copied_from" varchar(300) null, constraint "plan_pkey" primary key ("id"));`);
    this.addSql(`create index "plan_owner_id_updated_at_index" on "plan" ("owner_id", "updated_at");`);

    this.addSql(`create table "share_link" ("id" uuid not null, "created_at" timestamptz not null, "plan_id" uuid not null, "created_by_id" uuid not null, "token_hash" varchar(64) not null, "label" varchar(80) null, "expires_at" timestamptz null, "revoked_at" timestamptz null, "last_opened_at" timestamptz null, "open_count" int not null default 0, constraint "share_link_pkey" primary key ("id"));`);
    this.addSql(`alter table "share_link" add constraint "share_link_token_hash_unique" unique ("token_hash");`);

    this.addSql(`create table "plan_revision" ("id" uuid not null, "created_at" timestamptz not null, "plan_id" uuid not null, "version" int not null, "name" varchar(120) not null, "document" jsonb not null, "author_id" uuid not null, "note" varchar(200) null, constraint "plan_revision_pkey" primary key ("id"));`);
    this.addSql(`create index "plan_revision_plan_id_version_index" on "plan_revision" ("plan_id", "version");`);

    this.addSql(`create table "plan_member" ("id" uuid not null, "created_at" timestamptz not null, "plan_id" uuid not null, "user_id" uuid not null, "role" varchar(16) not null, constraint "plan_member_pkey" primary key ("id"));`);
    this.addSql(`alter table "plan_member" add constraint "plan_member_plan_id_user_id_unique" unique ("plan_id", "user_id");`);

    this.addSql(`create table "invitation" ("id" uuid not null, "created_at" timestamptz not null, "plan_id" uuid not null, "email" varchar(254) not null, "role" varchar(16) not null, "token_hash" varchar(64) not null, "invited_by_id" uuid not null, "expires_at" timestamptz not null, "accepted_at" timestamptz null, "revoked_at" timestamptz null, constraint "invitation_pkey" primary key ("id"));`);
    this.addSql(`alter table "invitation" add constraint "invitation_token_hash_unique" unique ("token_hash");`);

    this.addSql(`create table "email_token" ("id" uuid not null, "created_at" timestamptz not null, "user_id" uuid not null, "purpose" varchar(16) not null, "token_hash" varchar(64) not null, "expires_at" timestamptz not null, "used_at" timestamptz null, constraint "email_token_pkey" primary key ("id"));`);
    this.addSql(`alter table "email_token" add constraint "email_token_token_hash_unique" unique ("token_hash");`);

    this.addSql(`create table "walkthrough" ("id" uuid not null, "created_at" timestamptz not null, "plan_id" uuid not null, "owner_id" uuid not null, "title" varchar(120) not null, "steps" jsonb not null, "published" boolean not null default false, "view_token_hash" varchar(64) null, "updated_at" timestamptz not null, constraint "walkthrough_pkey" primary key ("id"));`);
    this.addSql(`alter table "walkthrough" add constraint "walkthrough_view_token_hash_unique" unique ("view_token_hash");`);

    this.addSql(`create table "wall_photo" ("id" uuid not null, "created_at" timestamptz not null, "plan_id" uuid not null, "wall_id" varchar(64) not null, "uploaded_by_id" uuid not null, "upload_key" varchar(200) not null, "clean_key" varchar(200) null, "status" varchar(16) not null default 'pending', "content_type" varchar(40) null, "bytes" int null, "width_px" int null, "height_px" int null, "scale" jsonb null, constraint "wall_photo_pkey" primary key ("id"));`);

    this.addSql(`alter table "rule_preset" add constraint "rule_preset_owner_id_foreign" foreign key ("owner_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "price_list" add constraint "price_list_owner_id_foreign" foreign key ("owner_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "plan" add constraint "plan_owner_id_foreign" foreign key ("owner_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "share_link" add constraint "share_link_plan_id_foreign" foreign key ("plan_id") references "plan" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "share_link" add constraint "share_link_created_by_id_foreign" foreign key ("created_by_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "plan_revision" add constraint "plan_revision_plan_id_foreign" foreign key ("plan_id") references "plan" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "plan_revision" add constraint "plan_revision_author_id_foreign" foreign key ("author_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "plan_member" add constraint "plan_member_plan_id_foreign" foreign key ("plan_id") references "plan" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "plan_member" add constraint "plan_member_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "invitation" add constraint "invitation_plan_id_foreign" foreign key ("plan_id") references "plan" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "invitation" add constraint "invitation_invited_by_id_foreign" foreign key ("invited_by_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "email_token" add constraint "email_token_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "walkthrough" add constraint "walkthrough_plan_id_foreign" foreign key ("plan_id") references "plan" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "walkthrough" add constraint "walkthrough_owner_id_foreign" foreign key ("owner_id") references "app_user" ("id") on update cascade on delete cascade;`);

    this.addSql(`alter table "wall_photo" add constraint "wall_photo_plan_id_foreign" foreign key ("plan_id") references "plan" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "wall_photo" add constraint "wall_photo_uploaded_by_id_foreign" foreign key ("uploaded_by_id") references "app_user" ("id") on update cascade on delete cascade;`);
  }

}
