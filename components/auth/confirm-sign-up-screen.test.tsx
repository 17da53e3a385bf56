import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { SignUpPreview } from '@/shared/api/auth';
import { meQueryKey } from '@/components/api/auth';
import { mockFetch, renderWithProviders, sessionAs } from '@/components/test-utils';
import { ConfirmSignUpScreen } from './confirm-sign-up-screen';

const mockToken = 'a-sign-up-token-long-enough-for-the-schema';
const mockReplace = jest.fn();
jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  router: { replace: (href: string) => mockReplace(href) },
  useLocalSearchParams: () => ({ token: mockToken }),
}));

const preview: SignUpPreview = { email: 'fern@lab.example', displayName: 'Fern Founder', teamName: 'Founders lab', expiresAt: '2026-12-09T09:00:00.000Z' };

beforeEach(() => mockReplace.mockClear());

describe('ConfirmSignUpScreen', () => {
  it('shows what the link makes, then the password creates team and account and signs in', async () => {
    const me = sessionAs('admin', 'Fern Founder');
    const { requests } = mockFetch({ status: 200, body: preview }, { status: 201, body: me });
    const { queryClient } = renderWithProviders(<ConfirmSignUpScreen />);

    expect(await screen.findByTestId('sign-up-summary')).toHaveTextContent(/Founders lab.*Fern Founder, admin.*fern@lab\.example.*9 Dec 2026/);
    fireEvent.changeText(screen.getByTestId('field-password'), 'a long founding passphrase');
    fireEvent.press(screen.getByTestId('submit-confirm-sign-up'));

    await waitFor(() => expect(mockReplace).toHaveBeenCalledWith('/'));
    expect(queryClient.getQueryData(meQueryKey)).toEqual(me);
    expect(requests[0]!.url).toBe(`/api/sign-up/${mockToken}`);
    expect(requests[1]).toEqual({ url: '/api/auth/sign-up/confirm', method: 'POST', body: { token: mockToken, password: 'a long founding passphrase' } });
  });

  it('says why a used or expired link cannot finish the sign-up', async () => {
    const message = 'this sign-up link is invalid, used or expired: sign up again for a new one';
    mockFetch({ status: 400, body: { name: 'ValidationError', message: `token: ${message}`, errors: [{ field: 'token', message }] } });
    renderWithProviders(<ConfirmSignUpScreen />);

    expect(await screen.findByTestId('confirm-unusable')).toHaveTextContent(/This sign-up link is invalid, used or expired: sign up again for a new one\./);
    expect(screen.queryByTestId('submit-confirm-sign-up')).toBeNull();
  });

  it('shows a refusal at confirmation (the address got an account meanwhile) without leaving', async () => {
    const message = 'this address has an account already: sign in, or reset its password';
    mockFetch({ status: 200, body: preview }, { status: 400, body: { name: 'ValidationError', message: `token: ${message}`, errors: [{ field: 'token', message }] } });
    renderWithProviders(<ConfirmSignUpScreen />);
    await screen.findByTestId('sign-up-summary');
    fireEvent.changeText(screen.getByTestId('field-password'), 'a long founding passphrase');
    fireEvent.press(screen.getByTestId('submit-confirm-sign-up'));

    expect(await screen.findByTestId('confirm-problem')).toHaveTextContent(/has an account already/);
    expect(mockReplace).not.toHaveBeenCalled();
  });

  it('asks someone already signed in to sign out first', async () => {
    mockFetch({ status: 200, body: preview });
    renderWithProviders(<ConfirmSignUpScreen />, { session: sessionAs('viewer', 'Vic Tanaka') });

    expect(await screen.findByTestId('confirm-signed-in')).toHaveTextContent(/You are signed in as Vic Tanaka.*This sign-up link makes a new account/);
    expect(screen.queryByTestId('submit-confirm-sign-up')).toBeNull();
  });
});
