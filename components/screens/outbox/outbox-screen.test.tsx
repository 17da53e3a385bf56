import { fireEvent, screen } from '@testing-library/react-native';
import type { OutboxMessage } from '@/shared/api/outbox';
import { mockFetch, renderWithProviders } from '@/components/test-utils';
import { OutboxScreen } from './outbox-screen';

function message(id: string, receivedAt: string, subject: string): OutboxMessage {
  return {
    id,
    receivedAt,
    from: 'frostgrade@localhost',
    to: ['ada@northlight.example'],
    subject,
    text: `Body of ${subject}`,
  };
}

describe('OutboxScreen', () => {
  it('lists messages newest first and expands one on press', async () => {
    mockFetch({
      status: 200,
      body: {
        messages: [
          message('a', '2026-02-01T08:00:00.000Z', 'Older: run finished'),
          message('b', '2026-02-03T08:00:00.000Z', 'Newer: profile released'),
        ],
      },
    });
    renderWithProviders(<OutboxScreen />);

    expect(await screen.findByText('Newer: profile released')).toBeOnTheScreen();
    const subjects = screen.getAllByText(/^(Older|Newer):/).map((node) => node.props.children);
    expect(subjects).toEqual(['Newer: profile released', 'Older: run finished']);
    expect(screen.queryByText('Body of Older: run finished')).toBeNull();

    fireEvent.press(screen.getByText('Older: run finished'));
    expect(screen.getByText('Body of Older: run finished')).toBeOnTheScreen();
    expect(screen.queryByText('Body of Newer: profile released')).toBeNull();

    fireEvent.press(screen.getByText('Older: run finished'));
    expect(screen.queryByText('Body of Older: run finished')).toBeNull();
  });

  it('explains that the outbox is development-only when the API answers 404', async () => {
    mockFetch({ status: 404, body: { name: 'NotFound', message: 'Not found: outbox' } });
    renderWithProviders(<OutboxScreen />);

    expect(
      await screen.findByText('The outbox is only available in development.'),
    ).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Try again' })).toBeNull();
  });
});
