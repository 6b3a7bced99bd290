import { Migration } from '@mikro-orm/migrations';

export class Migration20261202122053 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`create table "rate_bucket" ("key" varchar(200) not null, "window_start" timestamptz not null, "count" int not null, constraint "rate_bucket_pkey" primary key ("key"));`);
    this.addSql(`create index "rate_bucket_window_start_index" on "rate_bucket" ("window_start");`);
  }

  override async down(): Promise<void> {
    this.addSql(`drop table if exists "rate_bucket" cascade;`);
  }

}
