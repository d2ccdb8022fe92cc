import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { Calculator } from '@/components/calculator/calculator';
import type { MeterMemory } from '@/lib/calculator/memory';

let mockStored: MeterMemory | null = null;
jest.mock('@/lib/hooks/use-meter-memory', () => ({
  useMeterMemory: () => [mockStored, jest.fn()],
}));
jest.mock('@/components/jobs/add-to-job', () => ({ AddToJob: () => null }));

const SECONDARY = { min: 15.5, nominal: 17.5, max: 19.5, unit: 'kΩ' as const, material: 'copper' as const };

describe('Calculator (issue 10)', () => {
  beforeEach(() => {
    mockStored = { leadOhms: '0.4', meter: {} };
  });

  it('offers the remembered leads in Ω as a chip on a kΩ spec and takes off 0.4 Ω', async () => {
    render(<Calculator spec={SECONDARY} kind="resistance" />);
    await waitFor(() => expect(screen.getByText('Leads 0.4 Ω — from your last check')).toBeTruthy());
    fireEvent.changeText(screen.getByLabelText('Meter reading'), '16.3');
    expect(screen.getByTestId('verdict-word').props.children).toBe('PASS');
    expect(screen.getByTestId('verdict-explanation').props.children).toMatch(/^16\.2996 kΩ after taking off 0\.4 Ω/);
    // The corrections stay collapsed; the chip's clear takes the leads off the check.
    expect(screen.queryByLabelText('Test leads, probes shorted')).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Clear Leads 0.4 Ω' }));
    expect(screen.getByTestId('verdict-explanation').props.children).toMatch(/^16\.3 kΩ — inside/);
  });

  it('never offers the leads on a voltage check, and hints the count in volts', async () => {
    render(<Calculator spec={{ min: 12.5, unit: 'V' }} kind="voltage" />);
    expect(screen.queryByTestId('memory-chips')).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Add meter accuracy' }));
    expect(screen.getByText('The last digit on the range used, e.g. 0.01 V')).toBeTruthy();
    fireEvent.changeText(screen.getByLabelText('Meter reading'), '12.8');
    expect(screen.getByTestId('verdict-word').props.children).toBe('PASS');
    expect(screen.getByTestId('mode-instruction').props.children).toBe('Meter on DC volts');
  });

  it('says min > max in words, without asking for a reading that is typed', () => {
    render(<Calculator spec={{ min: 0.9, max: 0.7, unit: 'V' }} kind="voltage" />);
    fireEvent.changeText(screen.getByLabelText('Meter reading'), '0.8');
    expect(screen.getByTestId('spec-error').props.children).toBe(
      'The minimum (0.9 V) is above the maximum (0.7 V): check the limits.',
    );
    expect(screen.queryByText('Type the meter reading to see the verdict.')).toBeNull();
  });
});
