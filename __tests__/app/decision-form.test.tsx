import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { DecisionForm } from '@/components/corrections/decision-form';

describe('DecisionForm', () => {
  it('rejecting needs a note of a few characters; then sends it trimmed', async () => {
    const onReject = jest.fn();
    render(<DecisionForm stale={false} pending={false} onAccept={jest.fn()} onReject={onReject} />);

    expect(screen.getByRole('button', { name: 'Reject' })).toBeDisabled();
    fireEvent.changeText(screen.getByLabelText('Note to the proposer (required to reject)'), '  Not in the manual ');
    fireEvent.press(screen.getByRole('button', { name: 'Reject' }));

    await waitFor(() => expect(onReject).toHaveBeenCalledWith({ note: 'Not in the manual' }));
  });

  it('on a stale proposal, accepting waits for “I have compared”, then says so to the server', async () => {
    const onAccept = jest.fn();
    render(<DecisionForm stale pending={false} onAccept={onAccept} onReject={jest.fn()} />);

    expect(screen.getByRole('button', { name: 'Accept' })).toBeDisabled();
    fireEvent.press(screen.getByRole('radio', { name: 'I have compared the current values: Yes, apply anyway' }));
    fireEvent.press(screen.getByRole('button', { name: 'Accept' }));

    await waitFor(() => expect(onAccept).toHaveBeenCalledWith({ confirmStale: true, note: '' }));
  });
});
