import { useEffect, useState } from 'react';
import AsyncStorage from '@react-native-async-storage/async-storage';
import type { CalculatorForm } from '../calculator/form';

/** The meter accuracy and lead resistance a technician last used, kept on this device. */
export type MeterMemory = Pick<CalculatorForm, 'lead' | 'meterPercent' | 'meterCounts' | 'meterCountValue'>;

const KEY = 'specbench.meter-memory.v1';

export function useMeterMemory(): [MeterMemory | null, (m: MeterMemory) => void] {
  const [memory, setMemory] = useState<MeterMemory | null>(null);
  useEffect(() => {
    AsyncStorage.getItem(KEY)
      .then((text) =>
        setMemory(
          text
            ? (JSON.parse(text) as MeterMemory)
            : { lead: '', meterPercent: '', meterCounts: '', meterCountValue: '' },
        ),
      )
      .catch(() => setMemory({ lead: '', meterPercent: '', meterCounts: '', meterCountValue: '' }));
  }, []);
  const remember = (m: MeterMemory) => {
    AsyncStorage.setItem(KEY, JSON.stringify(m)).catch(() => undefined);
  };
  return [memory, remember];
}
