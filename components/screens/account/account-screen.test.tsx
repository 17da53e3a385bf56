import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { meQueryKey } from '@/components/api/auth';
import { mockFetch, renderWithProviders, sessionAs } from '@/components/test-utils';
import { AccountScreen } from './account-screen';

jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

function changePassword(current: string, next: string) {
  fireEvent.changeText(screen.getByTestId('field-currentPassword'), current);
  fireEvent.changeText(screen.getByTestId('field-newPassword'), next);
  fireEvent.press(screen.getByTestId('submit-password'));
}

describe('AccountScreen', () => {
  it('shows who you are, and a wrong current password beside its field', async () => {
    const message = 'this is not your current password';
    const { requests } = mockFetch({ status: 400, body: { name: 'ValidationError', message: `currentPassword: ${message}`, errors: [{ field: 'currentPassword', message }] } });
    renderWithProviders(<AccountScreen />, { session: sessionAs('physicist', 'Piet Jansen') });
    expect(screen.getByTestId('account-who')).toHaveTextContent(/Piet Jansen.*physicist@northlight\.example.*PHYSICIST/);

    changePassword('not it', 'a brand new passphrase');
    expect(await screen.findByTestId('error-currentPassword')).toHaveTextContent('This is not your current password.');
    expect(screen.queryByTestId('password-changed')).toBeNull();
    expect(requests).toEqual([{ url: '/api/auth/password', method: 'POST', body: { currentPassword: 'not it', newPassword: 'a brand new passphrase' } }]);
  });

  it('checks the new password with the shared schema first, then says the change is done and clears the fields', async () => {
    const { fake } = mockFetch({ status: 204, body: '' });
    renderWithProviders(<AccountScreen />, { session: sessionAs('viewer') });
    changePassword('the old passphrase', 'short');
    expect(screen.getByTestId('error-newPassword')).toHaveTextContent(/at least 10 characters/);
    expect(fake).not.toHaveBeenCalled();

    changePassword('the old passphrase', 'a brand new passphrase');
    expect(await screen.findByTestId('password-changed')).toHaveTextContent(/Every other session of your account was signed out; this one stays/);
    expect(screen.getByTestId('field-currentPassword').props.value).toBe('');
    expect(screen.getByTestId('field-newPassword').props.value).toBe('');
  });

  it('signs out everywhere after a second, explicit step, and drops the session', async () => {
    const { requests } = mockFetch({ status: 204, body: '' });
    const { queryClient } = renderWithProviders(<AccountScreen />, { session: sessionAs('admin') });
    queryClient.setQueryData(meQueryKey, sessionAs('admin'));

    fireEvent.press(screen.getByTestId('ask-sign-out-everywhere'));
    const confirm = screen.getByTestId('confirm-sign-out-everywhere');
    expect(confirm).toHaveTextContent(/Every session of your account ends at once, this one too/);
    expect(requests).toEqual([]);
    fireEvent.press(within(confirm).getByTestId('confirm'));

    // The session is dropped at once (the auth gate then shows the sign-in page).
    await waitFor(() => expect(queryClient.getQueryData(meQueryKey)).toBeNull());
    expect(requests).toEqual([{ url: '/api/auth/sign-out-everywhere', method: 'POST', body: undefined }]);
  });
});
