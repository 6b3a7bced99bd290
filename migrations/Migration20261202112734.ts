import { Migration } from '@mikro-orm/migrations';

export class Migration20261202112734 extends Migration {

  override async up(): Promise<void> {
    this.addSql(`alter table "app_user" add column "session_version" int not null default 1, add column "disabled_at" timestamptz null;`);
  }

  override async down(): Promise<void> {
    this.addSql(`alter table "app_user" drop column "session_version", drop column "disabled_at";`);
  }

}
