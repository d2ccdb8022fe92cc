import { fireEvent, render, screen } from '@testing-library/react-native';
import { SearchResults } from '@/components/library/search-results';
import type { SearchResultDto } from '@/lib/contracts/library';

const result: SearchResultDto = {
  query: 'test',
  total: 2,
  groups: [
    {
      model: {
        id: 7,
        make: { id: 1, name: 'Testmake' },
        name: 'Alpha 500',
        yearFrom: 2010,
        yearTo: 2014,
        variant: 'EU',
      },
      hits: [
        {
          specId: 11,
          component: 'Ignition coil',
          parameter: 'Primary winding resistance',
          quantityKind: 'resistance',
          min: 1,
          nominal: null,
          max: 2,
          unit: 'Ω',
          display: '1–2 Ω',
          score: 1,
        },
        {
          specId: 12,
          component: 'Spark plug',
          parameter: 'Electrode gap',
          quantityKind: 'length',
          min: 0.6,
          nominal: null,
          max: 0.7,
          unit: 'mm',
          display: '0.6–0.7 mm',
          score: 0.9,
        },
      ],
    },
  ],
};

describe('SearchResults', () => {
  it('shows each hit with its value inline, under its model', () => {
    render(<SearchResults result={result} onOpenSpec={jest.fn()} onOpenModel={jest.fn()} />);
    expect(screen.getByText('Testmake Alpha 500 (2010–2014, EU)')).toBeTruthy();
    expect(screen.getByText('1–2 Ω')).toBeTruthy();
    expect(screen.getByText('0.6–0.7 mm')).toBeTruthy();
    expect(screen.getByText('2 specs for “test”')).toBeTruthy();
  });

  it('opens the spec card when a hit is pressed, and the model sheet from its heading', () => {
    const onOpenSpec = jest.fn();
    const onOpenModel = jest.fn();
    render(<SearchResults result={result} onOpenSpec={onOpenSpec} onOpenModel={onOpenModel} />);
    fireEvent.press(screen.getByLabelText('Spark plug, Electrode gap: 0.6–0.7 mm'));
    expect(onOpenSpec).toHaveBeenCalledWith(12);
    fireEvent.press(screen.getByLabelText('Open model sheet Testmake Alpha 500 (2010–2014, EU)'));
    expect(onOpenModel).toHaveBeenCalledWith(7);
  });
});
