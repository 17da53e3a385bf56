import { roles } from '@/shared/api/auth';
import { actionRoles, roleCan, type Action } from './permissions';

const actions = Object.keys(actionRoles) as Action[];

describe('roleCan', () => {
  it('lets an admin take every action', () => {
    for (const action of actions) expect(roleCan('admin', action)).toBe(true);
  });

  it('lets a viewer read the work of the team and change nothing', () => {
    expect(actions.filter((action) => roleCan('viewer', action))).toEqual(['families.read', 'designs.read', 'growth.read']);
  });

  it('follows the role table of the design for physicists and growers', () => {
    const allowed = (role: 'physicist' | 'grower') => actions.filter((action) => roleCan(role, action));
    expect(allowed('physicist')).toEqual(['families.write', 'designs.write', 'runs.launch', 'profiles.release', 'growth.scatter', 'families.read', 'designs.read', 'growth.read']);
    expect(allowed('grower')).toEqual(['growth.update', 'measurements.upload', 'growth.scatter', 'families.read', 'growth.read']);
  });

  it('refuses everything when nobody is signed in', () => {
    for (const action of actions) {
      expect(roleCan(null, action)).toBe(false);
      expect(roleCan(undefined, action)).toBe(false);
    }
  });

  it('names only roles that exist', () => {
    for (const allowed of Object.values(actionRoles)) {
      for (const role of allowed) expect(roles).toContain(role);
    }
  });
});
