import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/**
 * A row of connect-pg-simple's session store (express-session), in the layout of its table.sql.
 * Mapped so that the schema, migrations and snapshot cover it; read and written by the store only.
 */
@Entity({ tableName: 'session' })
export class HttpSession {
  @PrimaryKey({ type: 'string', columnType: 'varchar' })
  sid!: string;

  @Property({ type: 'json', columnType: 'json' })
  sess!: Record<string, unknown>;

  @Index({ name: 'IDX_session_expire' })
  @Property({ type: 'datetime', columnType: 'timestamp(6)' })
  expire!: Date;
}
