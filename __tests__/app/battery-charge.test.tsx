import { fireEvent, render, screen } from '@testing-library/react-native';
import { BatteryCharge } from '@/components/calculator/battery-charge';

describe('BatteryCharge', () => {
  it('reads a flooded battery at 12.45 V as 75 % (a table row)', () => {
    // Source: Battery Council International table for flooded batteries at 80 °F, REFERENCES §5 [quoted]: 12.45 V = 75 %.
    render(<BatteryCharge />);
    fireEvent.changeText(screen.getByLabelText('Rest voltage, V'), '12.45');
    expect(screen.getByText('About 75 % charged')).toBeTruthy();
  });

  it('switches to the AGM table and says when it interpolates', () => {
    // Source: battery maker's AGM FAQ, REFERENCES §5 [quoted]: 12.60 V = 75 %, 12.30 V = 50 %; 12.45 V interpolates to 62.5 % [computed].
    render(<BatteryCharge />);
    fireEvent.press(screen.getByLabelText('Battery type: AGM'));
    fireEvent.changeText(screen.getByLabelText('Rest voltage, V'), '12,45');
    expect(screen.getByText('About 62.5 % charged')).toBeTruthy();
    expect(screen.getByText(/interpolated linearly/)).toBeTruthy();
  });

  it('asks for a number when the text is not one', () => {
    render(<BatteryCharge />);
    fireEvent.changeText(screen.getByLabelText('Rest voltage, V'), 'twelve');
    expect(screen.getByText('Type a number, e.g. 12.48')).toBeTruthy();
  });
});
