import { useState, type ReactNode } from 'react';
import { Text } from 'react-native';
import { QueryClientProvider } from '@tanstack/react-query';
import { Slot } from 'expo-router';
import { fireEvent, renderRouter, screen } from 'expo-router/testing-library';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { MaterialsScreen } from '@/components/screens/materials/materials-screen';
import { SectionStack } from '@/components/screens/runs/section-stack';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { tabs } from '@/components/shell/tabs';
import { createTestQueryClient, mockFetch, sessionAs } from '@/components/test-utils';
import { AuthGate } from './auth-gate';
import { AuthLayout } from './auth-layout';
import { SignInScreen } from './sign-in-screen';
import { SignedInShell } from './signed-in-shell';

// The materials list at "/" is a stand-in (the role decides whether "/" shows it at all).
jest.mock('@/components/screens/materials/materials-screen', () => {
  const { Text: MockText } = jest.requireActual<typeof import('react-native')>('react-native');
  return { MaterialsScreen: () => <MockText>Materials home</MockText> };
});

const metrics = { frame: { x: 0, y: 0, width: 390, height: 844 }, insets: { top: 0, left: 0, right: 0, bottom: 0 } };

/** The app's root layout, with a test query client (no retries). */
function Root() {
  const [client] = useState(createTestQueryClient);
  return (
    <SafeAreaProvider initialMetrics={metrics}>
      <QueryClientProvider client={client}>
        <AuthGate>
          <Slot />
        </AuthGate>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}

const page = (text: string) =>
  function Page(): ReactNode {
    return <Text>{text}</Text>;
  };

/** A stand-in page (or group with its layout) for every tab of the shell, so every trigger has a route. */
function tabRoutes(): Record<string, () => ReactNode> {
  const found: Record<string, () => ReactNode> = {};
  for (const tab of tabs) {
    const href = String(tab.href);
    if (tab.name === '(team)') continue;
    if (!tab.name.startsWith('(')) {
      found[`(tabs)/${tab.name}`] = page(`${tab.label} page`);
      continue;
    }
    found[`(tabs)/${tab.name}/_layout`] = () => <Slot />;
    found[`(tabs)/${tab.name}${href}/index`] = page(`${tab.label} page`);
  }
  return found;
}

/** The real layouts and sign-in page; the tab pages are stand-ins. */
const routes = {
  _layout: Root,
  '(auth)/_layout': AuthLayout,
  '(auth)/sign-in': SignInScreen,
  '(auth)/sign-up': page('Sign-up page'),
  '(auth)/forgot-password': page('Forgot page'),
  '(tabs)/_layout': SignedInShell,
  ...tabRoutes(),
  '(tabs)/(materials)/index': MaterialsScreen,
  // The real stack of the Runs tab: it explains the pages of its own that a role may not use.
  '(tabs)/(runs)/_layout': SectionStack,
  '(tabs)/(team)/_layout': () => <Slot />,
  '(tabs)/(team)/team/index': () => (
    <ScreenFrame title="Team page">
      <Text>Members</Text>
    </ScreenFrame>
  ),
  '(tabs)/(team)/account': page('Account page'),
};

const unauthorized = { status: 401, body: { name: 'Unauthorized', message: 'Sign in first.' } };

describe('the auth gate', () => {
  it('sends the signed-out to the sign-in page and keeps where they were going', async () => {
    mockFetch(unauthorized);
    const router = renderRouter(routes, { initialUrl: '/team' });

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/sign-in');
    expect(router.getSearchParams()).toEqual({ next: '/team' });
    expect(screen.queryByText('Team page')).toBeNull();
    expect(screen.queryByTestId('nav-bottom-tabs')).toBeNull();
  });

  it('shows the shell to a signed-in member, with the tabs of their role', async () => {
    mockFetch({ status: 200, body: sessionAs('physicist', 'Piet Bos') });
    const router = renderRouter(routes, { initialUrl: '/' });

    expect(await screen.findByText('Materials home')).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/');
    expect(screen.getByTestId('nav-bottom-tabs')).toBeOnTheScreen();
    for (const name of ['Materials', 'Designs', 'Runs', 'Growth', 'Team']) expect(screen.getByRole('tab', { name })).toBeOnTheScreen();
    expect(screen.queryByRole('tab', { name: 'Outbox' })).toBeNull();
  });

  it('starts a grower on the growth orders, with no Designs or Runs tab', async () => {
    mockFetch({ status: 200, body: sessionAs('grower', 'Greta Hahn') });
    const router = renderRouter(routes, { initialUrl: '/' });

    expect(await screen.findByText('Growth page')).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/growth');
    expect(screen.getByRole('tab', { name: 'Materials' })).toBeOnTheScreen();
    expect(screen.queryByRole('tab', { name: 'Designs' })).toBeNull();
    expect(screen.queryByRole('tab', { name: 'Runs' })).toBeNull();
  });

  it('explains a page the role may not see, reached by address, instead of showing it', async () => {
    mockFetch({ status: 200, body: sessionAs('viewer', 'Vera Lind') });
    renderRouter(routes, { initialUrl: '/outbox' });

    expect(await screen.findByTestId('role-refusal')).toHaveTextContent(
      /Your role, viewer, cannot see the outbox; ask an admin of Northlight Sensors — detector cooling group if you need to\.$/,
    );
    expect(screen.queryByText('Outbox page')).toBeNull();
    expect(screen.queryByText(/Try again/)).toBeNull();
  });

  it('explains a page inside a tab’s stack the same way', async () => {
    mockFetch({ status: 200, body: sessionAs('grower', 'Greta Hahn') });
    renderRouter(routes, { initialUrl: '/runs' });

    expect(await screen.findByTestId('role-refusal')).toHaveTextContent(/Your role, grower, cannot see designs, runs and modules/);
    expect(screen.queryByText('Runs page')).toBeNull();
  });

  it('gives an admin the Outbox tab', async () => {
    mockFetch({ status: 200, body: sessionAs('admin') });
    renderRouter(routes, { initialUrl: '/' });

    expect(await screen.findByRole('tab', { name: 'Outbox' })).toBeOnTheScreen();
  });

  it('sends a signed-in member away from the sign-in page', async () => {
    mockFetch({ status: 200, body: sessionAs('viewer') });
    const router = renderRouter(routes, { initialUrl: '/sign-in?next=/system' });

    expect(await screen.findByText('System page')).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/system');
  });

  it('signs out from the phone account menu, back to a plain sign-in page', async () => {
    const { requests } = mockFetch({ status: 200, body: sessionAs('physicist', 'Piet Jansen') }, { status: 204, body: '' });
    const router = renderRouter(routes, { initialUrl: '/team' });
    expect(await screen.findByText('Team page')).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Account of Piet Jansen' }));
    expect(screen.getByTestId('account-menu')).toHaveTextContent(/PHYSICIST.*Northlight Sensors/);
    fireEvent.press(screen.getByTestId('sign-out'));

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/sign-in');
    expect(router.getSearchParams()).toEqual({});
    expect(requests.map((r) => `${r.method} ${r.url}`)).toEqual(['GET /api/auth/me', 'POST /api/auth/sign-out']);
  });

  it('opens password and sessions from the phone account menu', async () => {
    mockFetch({ status: 200, body: sessionAs('viewer', 'Vic Tanaka') });
    const router = renderRouter(routes, { initialUrl: '/team' });
    expect(await screen.findByText('Team page')).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Account of Vic Tanaka' }));
    fireEvent.press(screen.getByTestId('open-account'));

    expect(await screen.findByText('Account page')).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/account');
    expect(screen.queryByTestId('account-menu')).toBeNull();
  });

  it('says so when the server cannot be reached at start, and offers a retry', async () => {
    global.fetch = jest.fn(async () => {
      throw new TypeError('Failed to fetch');
    }) as unknown as typeof fetch;
    renderRouter(routes, { initialUrl: '/' });

    expect(await screen.findByText('Frostgrade is not answering')).toBeOnTheScreen();
    expect(screen.getByText(/Could not reach the Frostgrade server/)).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeOnTheScreen();
    expect(screen.queryByText('Materials home')).toBeNull();
  });
});
