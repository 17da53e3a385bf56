import { fireEvent, screen, within } from '@testing-library/react-native';
import type { TeamResponse } from '@/shared/api/auth';
import { mockFetch, renderWithProviders, sessionAs } from '@/components/test-utils';
import { TeamScreen } from './team-screen';

const team: TeamResponse = {
  members: [
    { id: 'user-admin', email: 'ada@northlight.example', displayName: 'Ada Lovelace', role: 'admin', joinedAt: '2026-11-01T09:00:00.000Z' },
    { id: 'user-physicist', email: 'piet@northlight.example', displayName: 'Piet Jansen', role: 'physicist', joinedAt: '2026-11-02T09:00:00.000Z' },
    { id: 'user-viewer', email: 'vic@northlight.example', displayName: 'Vic Oduya', role: 'viewer', joinedAt: '2026-11-03T09:00:00.000Z' },
  ],
  invitations: [
    {
      id: '3f0c1a52-4a1b-4c55-9d1e-2b7f00000001',
      email: 'new.grower@northlight.example',
      role: 'grower',
      invitedBy: 'Ada Lovelace',
      createdAt: '2026-12-01T09:00:00.000Z',
      expiresAt: '2026-12-08T09:00:00.000Z',
      state: 'pending',
    },
    {
      id: '3f0c1a52-4a1b-4c55-9d1e-2b7f00000002',
      email: 'old@northlight.example',
      role: 'viewer',
      invitedBy: 'Ada Lovelace',
      createdAt: '2026-10-01T09:00:00.000Z',
      expiresAt: '2026-10-08T09:00:00.000Z',
      state: 'expired',
    },
  ],
};

/** On a narrow screen the form waits behind a button. */
function openInviteForm() {
  const opener = screen.queryByTestId('open-invite');
  if (opener) fireEvent.press(opener);
}

const adminActions = [/^Change role of /, /^Remove /, /^Revoke the invitation/];

describe('TeamScreen', () => {
  it('shows a viewer the members and invitations, and no admin action', async () => {
    mockFetch({ status: 200, body: team });
    renderWithProviders(<TeamScreen />, { session: sessionAs('viewer', 'Vic Oduya') });

    const piet = await screen.findByTestId('member-piet@northlight.example');
    expect(piet).toHaveTextContent(/Piet Jansen.*PHYSICIST.*piet@northlight\.example.*Joined 2 Nov 2026/);
    expect(screen.getByTestId('invitation-new.grower@northlight.example')).toHaveTextContent(/GROWER.*Pending/);
    expect(screen.getByTestId('invitation-old@northlight.example')).toHaveTextContent(/Expired/);
    expect(screen.getByTestId('role-note')).toHaveTextContent(/Your role: Viewer/);

    for (const name of adminActions) expect(screen.queryAllByRole('button', { name })).toHaveLength(0);
    expect(screen.queryByTestId('invite-form')).toBeNull();
    expect(screen.queryByTestId('open-invite')).toBeNull();
    expect(screen.queryByTestId('open-audit')).toBeNull();
  });

  it('gives an admin invite, role, remove and revoke, but not removing themselves', async () => {
    mockFetch({ status: 200, body: team });
    renderWithProviders(<TeamScreen />, { session: sessionAs('admin', 'Ada Lovelace') });

    await screen.findByTestId('member-piet@northlight.example');
    openInviteForm();
    expect(screen.getByTestId('invite-form')).toBeOnTheScreen();
    expect(screen.getAllByRole('button', { name: /^Change role of / })).toHaveLength(3);
    expect(screen.getAllByRole('button', { name: /^Remove / })).toHaveLength(2);
    expect(screen.queryByRole('button', { name: 'Remove Ada Lovelace' })).toBeNull();
    // Only the pending invitation can be revoked.
    expect(screen.getAllByRole('button', { name: /^Revoke the invitation/ })).toHaveLength(1);
    expect(screen.queryByTestId('role-note')).toBeNull();
    expect(screen.getByTestId('open-audit')).toHaveTextContent('Audit trail');
  });

  it('asks before removing, and shows the "last admin" conflict', async () => {
    const conflict = {
      name: 'Conflict',
      message: 'The team needs at least one admin: make someone else admin first.',
      errors: [{ field: 'role', message: 'last admin' }],
    };
    const { requests } = mockFetch({ status: 200, body: team }, { status: 409, body: conflict });
    renderWithProviders(<TeamScreen />, { session: sessionAs('admin', 'Ada Lovelace') });

    await screen.findByTestId('member-piet@northlight.example');
    fireEvent.press(screen.getByRole('button', { name: 'Remove Piet Jansen' }));
    const confirm = screen.getByTestId('confirm-remove');
    expect(confirm).toHaveTextContent(/Remove Piet Jansen from the team\?/);
    expect(confirm).toHaveTextContent(/Piet Jansen is signed out everywhere at once/);
    expect(confirm).toHaveTextContent(/runs, releases, uploads and growth steps stay with the team under their name/);
    expect(requests).toHaveLength(1);

    fireEvent.press(within(confirm).getByTestId('confirm'));
    expect(await screen.findByTestId('remove-problem')).toHaveTextContent(
      /The team needs at least one admin: make someone else admin first\./,
    );
    expect(requests[1]).toEqual({ url: '/api/team/members/user-physicist', method: 'DELETE', body: undefined });
  });

  it('invites with the chosen role', async () => {
    const { requests } = mockFetch({ status: 200, body: team }, { status: 201, body: team });
    renderWithProviders(<TeamScreen />, { session: sessionAs('admin', 'Ada Lovelace') });

    await screen.findByTestId('member-piet@northlight.example');
    openInviteForm();
    fireEvent.changeText(screen.getByTestId('field-invite-email'), 'lena@northlight.example');
    fireEvent.press(screen.getByRole('radio', { name: 'Grower' }));
    fireEvent.press(screen.getByTestId('send-invitation'));

    expect(await screen.findByTestId('invite-sent')).toHaveTextContent(/lena@northlight\.example/);
    expect(requests[1]).toEqual({
      url: '/api/team/invitations',
      method: 'POST',
      body: { email: 'lena@northlight.example', role: 'grower' },
    });
  });
});
