import type { User } from 'lucia';
import type { DataSource } from 'typeorm';
import { isUuid } from '../http/validate';

/** Object kinds a browser may watch, each checked against the watcher's team. */
const tables: Record<string, string> = { family: 'material_family', run: 'run', design: 'design', sweep: 'sweep', growth: 'growth_order' };

export function watchRules(ds: DataSource): (user: User, room: string) => Promise<boolean> {
  return async (user, room) => {
    const [kind, id] = room.split(':');
    const table = kind ? tables[kind] : undefined;
    if (!table || !isUuid(id)) return false;
    const rows = await ds.query(`SELECT 1 FROM ${table} WHERE id = $1 AND team_id = $2`, [id, user.teamId]);
    return rows.length > 0;
  };
}
