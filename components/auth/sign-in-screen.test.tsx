import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { meQueryKey } from '@/components/api/auth';
import { mockFetch, renderWithProviders, sessionAs } from '@/components/test-utils';
import { SignInScreen } from './sign-in-screen';

jest.mock('expo-router', () => ({ Link: ({ children }: { children: unknown }) => children }));

function fillAndSubmit(email: string, password: string) {
  fireEvent.changeText(screen.getByTestId('field-email'), email);
  fireEvent.changeText(screen.getByTestId('field-password'), password);
  fireEvent.press(screen.getByTestId('submit-sign-in'));
}

describe('SignInScreen', () => {
  it('checks the form with the shared schema before asking the server', () => {
    const { fake } = mockFetch({ status: 500, body: {} });
    renderWithProviders(<SignInScreen />);
    fillAndSubmit('ada at northlight', '');

    expect(screen.getByTestId('error-email')).toHaveTextContent('Not a valid address.');
    expect(screen.getByTestId('error-password')).toHaveTextContent('Required.');
    expect(fake).not.toHaveBeenCalled();
  });

  it('shows a refused sign-in beside the password field', async () => {
    const { requests } = mockFetch({
      status: 400,
      body: {
        name: 'SignInFailed',
        message: 'E-mail or password is wrong.',
        errors: [{ field: 'password', message: 'e-mail or password is wrong' }],
      },
    });
    renderWithProviders(<SignInScreen />);
    fillAndSubmit('ada@northlight.example', 'not the password');

    expect(await screen.findByTestId('error-password')).toHaveTextContent('E-mail or password is wrong.');
    expect(screen.queryByTestId('error-email')).toBeNull();
    expect(requests).toEqual([
      {
        url: '/api/auth/sign-in',
        method: 'POST',
        body: { email: 'ada@northlight.example', password: 'not the password' },
      },
    ]);
  });

  it('clears a field message once the field is edited', async () => {
    mockFetch({
      status: 400,
      body: { name: 'SignInFailed', message: 'E-mail or password is wrong.', errors: [{ field: 'password', message: 'e-mail or password is wrong' }] },
    });
    renderWithProviders(<SignInScreen />);
    fillAndSubmit('ada@northlight.example', 'not the password');
    await screen.findByTestId('error-password');

    fireEvent.changeText(screen.getByTestId('field-password'), 'another try');
    expect(screen.queryByTestId('error-password')).toBeNull();
  });

  it('says when there were too many attempts (429)', async () => {
    mockFetch({ status: 429, body: { name: 'TooManyRequests', message: 'Too many attempts; try again in 15 minutes.' } });
    renderWithProviders(<SignInScreen />);
    fillAndSubmit('ada@northlight.example', 'graded-legs-demo');

    expect(await screen.findByTestId('sign-in-problem')).toHaveTextContent(/Too many attempts; try again in 15 minutes\./);
    expect(screen.queryByTestId('error-password')).toBeNull();
  });

  it('stores the new session once the server accepts', async () => {
    const me = sessionAs('physicist', 'Piet Jansen');
    mockFetch({ status: 200, body: me });
    const { queryClient } = renderWithProviders(<SignInScreen />);
    queryClient.setQueryData(['families', 'active'], { stale: 'from the last session' });
    fillAndSubmit('piet@northlight.example', 'graded-legs-demo');

    await waitFor(() => expect(queryClient.getQueryData(meQueryKey)).toEqual(me));
    expect(queryClient.getQueryData(['families', 'active'])).toBeUndefined();
  });
});
