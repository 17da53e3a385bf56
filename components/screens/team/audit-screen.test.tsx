import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { AuditEvent, AuditPage } from '@/shared/api/audit';
import { mockFetch, renderWithProviders, sessionAs } from '@/components/test-utils';
import { AuditScreen } from './audit-screen';

jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

function event(id: number, overrides: Partial<AuditEvent>): AuditEvent {
  return {
    id: String(id), at: '2026-12-04T10:15:00.000Z', action: 'sign-in', actor: 'Ada Lovelace', actorId: 'user-admin',
    email: 'ada@northlight.example', subjectId: 'user-admin', summary: 'signed in', ip: '203.0.113.7', ...overrides,
  };
}

const first: AuditPage = {
  events: [
    event(12, { action: 'role-changed', summary: 'changed the role of Piet Jansen from physicist to viewer', email: 'piet@northlight.example' }),
    event(11, { action: 'sign-in-failed', actor: null, actorId: null, email: 'piet@northlight.example', summary: 'sign-in refused: wrong e-mail or password', ip: '198.51.100.9' }),
  ],
  next: '11',
};
const older: AuditPage = { events: [event(3, { action: 'team-created', summary: 'created the team Northlight' })], next: null };

describe('AuditScreen', () => {
  it('lists who did what, when and from where, newest first, and loads older events on demand', async () => {
    const { requests } = mockFetch({ status: 200, body: first }, { status: 200, body: older });
    renderWithProviders(<AuditScreen />, { session: sessionAs('admin') });

    expect(await screen.findByTestId('audit-12')).toHaveTextContent(/4 Dec 2026, 10:15 UTC.*ROLE CHANGED.*Ada Lovelace changed the role of Piet Jansen from physicist to viewer.*piet@northlight\.example.*203\.0\.113\.7/);
    expect(screen.getByTestId('audit-11')).toHaveTextContent(/SIGN-IN REFUSED.*someone trying piet@northlight\.example sign-in refused.*198\.51\.100\.9/);
    expect(screen.getByTestId('audit-csv')).toBeOnTheScreen();

    fireEvent.press(screen.getByTestId('audit-older'));
    expect(await screen.findByTestId('audit-3')).toHaveTextContent(/TEAM CREATED/);
    await waitFor(() => expect(screen.queryByTestId('audit-older')).toBeNull());
    expect(requests.map((r) => r.url)).toEqual(['/api/audit?limit=50', '/api/audit?limit=50&before=11']);
  });

  it('tells a member who is not an admin that the trail is for admins, and asks nothing', () => {
    const { fake } = mockFetch({ status: 403, body: { name: 'Forbidden', message: 'Your role (viewer) may not do this.' } });
    renderWithProviders(<AuditScreen />, { session: sessionAs('viewer') });
    expect(screen.getByTestId('audit-admins-only')).toBeOnTheScreen();
    expect(screen.queryByTestId('audit-csv')).toBeNull();
    expect(fake).not.toHaveBeenCalled();
  });
});
