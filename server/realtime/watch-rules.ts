import type { User } from 'lucia';
import type { DataSource } from 'typeorm';
import { objectReaders, type ObjectKind } from '../http/object-access';
import { isUuid } from '../http/validate';

/**
 * Object kinds a browser may watch (`<kind>:<id>` rooms) and their tables.
 * Who may watch one is who may read it over HTTP (`objectReaders`, the
 * route table's source), and only objects of the watcher's own team.
 */
const tables: Partial<Record<ObjectKind, string>> = { family: 'material_family', run: 'run', design: 'design', sweep: 'sweep', growth: 'growth_order' };

export const watchableKinds = Object.keys(tables) as ObjectKind[];

const isKind = (kind: string | undefined): kind is ObjectKind => (watchableKinds as readonly string[]).includes(kind ?? '');

export function watchRules(ds: DataSource): (user: User, room: string) => Promise<boolean> {
  return async (user, room) => {
    const [kind, id] = room.split(':');
    if (!isKind(kind) || !isUuid(id)) return false;
    if (!objectReaders[kind].includes(user.role)) return false;
    const rows = await ds.query(`SELECT 1 FROM ${tables[kind]} WHERE id = $1 AND team_id = $2`, [id, user.teamId]);
    return rows.length > 0;
  };
}
