import { Migration } from '@mikro-orm/migrations';

export class Migration20261202163533 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "shop_check" ("id" uuid not null, "created_at" timestamptz not null, "plan_id" uuid not null, "user_id" uuid not null, "item" varchar(140) not null, "delta" smallint not null, "made_at" timestamptz not null, constraint "shop_check_pkey" primary key ("id"));`);
    this.addSql(`create index "shop_check_plan_id_item_index" on "shop_check" ("plan_id", "item");`);

    this.addSql(`alter table "shop_check" add constraint "shop_check_plan_id_foreign" foreign key ("plan_id") references "plan" ("id") on update cascade on delete cascade;`);
    this.addSql(`alter table "shop_check" add constraint "shop_check_user_id_foreign" foreign key ("user_id") references "app_user" ("id") on update cascade on delete cascade;`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "shop_check" cascade;`);
  }

}
