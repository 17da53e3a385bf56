import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { meQueryKey } from '@/components/api/auth';
import { mockFetch, renderWithProviders } from '@/components/test-utils';
import { SignUpScreen } from './sign-up-screen';

jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

const queued = { message: 'Check your inbox: we sent a link to finish creating your team to this address.' };

function fill(values: { displayName: string; email: string; teamName: string }) {
  fireEvent.changeText(screen.getByTestId('field-displayName'), values.displayName);
  fireEvent.changeText(screen.getByTestId('field-email'), values.email);
  fireEvent.changeText(screen.getByTestId('field-teamName'), values.teamName);
  fireEvent.press(screen.getByTestId('submit-sign-up'));
}

describe('SignUpScreen', () => {
  it('asks for no password: sends name, address and team, then says to check the inbox, signed in as nobody yet', async () => {
    const { requests } = mockFetch({ status: 202, body: queued });
    const { queryClient } = renderWithProviders(<SignUpScreen />);
    expect(screen.queryByTestId('field-password')).toBeNull();
    fill({ displayName: 'Fern Founder', email: 'fern@lab.example', teamName: 'Founders lab' });

    expect(await screen.findByTestId('sign-up-requested')).toHaveTextContent(/We sent an e-mail to fern@lab\.example.*choose your password.*24 hours.*already has an account/);
    expect(screen.getByRole('heading', { name: 'Check your inbox' })).toBeOnTheScreen();
    expect(requests).toEqual([{ url: '/api/auth/sign-up', method: 'POST', body: { displayName: 'Fern Founder', email: 'fern@lab.example', teamName: 'Founders lab' } }]);
    expect(queryClient.getQueryData(meQueryKey)).toBeUndefined();

    fireEvent.press(screen.getByTestId('sign-up-again'));
    expect(await screen.findByTestId('submit-sign-up')).toBeOnTheScreen();
    // What was typed is still there, to correct the address.
    expect(screen.getByTestId('field-email').props.value).toBe('fern@lab.example');
  });

  it('checks the form with the shared schema before asking the server', () => {
    const { fake } = mockFetch({ status: 500, body: {} });
    renderWithProviders(<SignUpScreen />);
    fill({ displayName: '', email: 'not an address', teamName: 'L' });

    expect(screen.getByTestId('error-email')).toHaveTextContent('Not a valid address.');
    expect(screen.getByTestId('error-teamName')).toHaveTextContent('Needs at least 2 characters.');
    expect(fake).not.toHaveBeenCalled();
  });

  it('says when too many sign-ups came from this address (429)', async () => {
    mockFetch({ status: 429, body: { name: 'TooManyRequests', message: 'Too many attempts: at most 10 sign-up requests from one network address in an hour; try again in 42 minutes.' } });
    renderWithProviders(<SignUpScreen />);
    fill({ displayName: 'Fern', email: 'fern@lab.example', teamName: 'Founders lab' });

    expect(await screen.findByText(/at most 10 sign-up requests from one network address/)).toBeOnTheScreen();
    await waitFor(() => expect(screen.queryByTestId('sign-up-requested')).toBeNull());
  });
});
