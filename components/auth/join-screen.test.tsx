import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { InvitationPreview } from '@/shared/api/auth';
import { mockFetch, renderWithProviders, sessionAs } from '@/components/test-utils';
import { JoinScreen } from './join-screen';

const mockToken = 'a-token-long-enough-to-pass-the-schema';
const mockReplace = jest.fn();
jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  router: { replace: (href: string) => mockReplace(href) },
  useLocalSearchParams: () => ({ token: mockToken }),
}));

const preview: InvitationPreview = {
  email: 'lena@northlight.example',
  role: 'grower',
  teamName: 'Northlight Sensors — detector cooling group',
  expiresAt: '2026-12-08T09:00:00.000Z',
};

beforeEach(() => mockReplace.mockClear());

describe('JoinScreen', () => {
  it('shows team, role and address, then makes the account and goes home', async () => {
    const me = sessionAs('grower', 'Lena Berg');
    const { requests } = mockFetch({ status: 200, body: preview }, { status: 201, body: me });
    renderWithProviders(<JoinScreen />);

    const summary = await screen.findByTestId('invitation-summary');
    expect(summary).toHaveTextContent(/Northlight Sensors — detector cooling group.*GROWER.*lena@northlight\.example.*8 Dec 2026/);
    fireEvent.changeText(screen.getByTestId('field-displayName'), 'Lena Berg');
    fireEvent.changeText(screen.getByTestId('field-password'), 'a long grower passphrase');
    fireEvent.press(screen.getByTestId('submit-join'));

    await waitFor(() => expect(mockReplace).toHaveBeenCalledWith('/'));
    expect(requests[0].url).toBe(`/api/invitations/${mockToken}`);
    expect(requests[1]).toEqual({
      url: '/api/invitations/accept',
      method: 'POST',
      body: { token: mockToken, displayName: 'Lena Berg', password: 'a long grower passphrase' },
    });
  });

  it('says why a used or revoked link cannot be accepted', async () => {
    mockFetch({
      status: 400,
      body: {
        name: 'ValidationError',
        message: 'token: this invitation link is invalid, used, revoked or expired: ask your admin for a new one',
        errors: [{ field: 'token', message: 'this invitation link is invalid, used, revoked or expired: ask your admin for a new one' }],
      },
    });
    renderWithProviders(<JoinScreen />);

    expect(await screen.findByTestId('join-unusable')).toHaveTextContent(
      /This invitation link is invalid, used, revoked or expired: ask your admin for a new one\./,
    );
    expect(screen.queryByTestId('submit-join')).toBeNull();
  });

  it('asks someone already signed in to sign out first', async () => {
    mockFetch({ status: 200, body: preview });
    renderWithProviders(<JoinScreen />, { session: sessionAs('viewer', 'Vic Tanaka') });

    expect(await screen.findByTestId('join-signed-in')).toHaveTextContent(/You are signed in as Vic Tanaka/);
    expect(screen.queryByTestId('submit-join')).toBeNull();
  });
});
