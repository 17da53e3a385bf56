import { documentTitle, sectionOfRoute } from './document-title';

describe('document titles', () => {
  it('reads page · section · app, saying a page named like its section once', () => {
    expect(documentTitle('Run 12', 'Runs')).toBe('Run 12 · Runs · Frostgrade');
    expect(documentTitle('Runs', 'Runs')).toBe('Runs · Frostgrade');
    expect(documentTitle('Sign in', null)).toBe('Sign in · Frostgrade');
  });

  it('finds the section from the route name inside its stack', () => {
    expect(sectionOfRoute('runs/[id]')).toBe('Runs');
    expect(sectionOfRoute('runs/[id]/curves')).toBe('Runs');
    expect(sectionOfRoute('sweeps/[id]')).toBe('Runs');
    expect(sectionOfRoute('modules/new')).toBe('Modules');
    expect(sectionOfRoute('index')).toBe('Materials');
    expect(sectionOfRoute('materials/[id]/index')).toBe('Materials');
    expect(sectionOfRoute('growth/[id]')).toBe('Growth');
    expect(sectionOfRoute('team/audit')).toBe('Team');
    expect(sectionOfRoute('somewhere-new')).toBeNull();
    expect(sectionOfRoute(undefined)).toBeNull();
  });
});
