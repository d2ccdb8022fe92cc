import { useEffect, useState } from 'react';
import AsyncStorage from '@react-native-async-storage/async-storage';
import { EMPTY_MEMORY, parseMemory, type MeterMemory } from '../calculator/memory';

export type { MeterMemory };

/** The meter accuracy and lead resistance a technician last used, kept on this device (lib/calculator/memory). */
const KEY = 'specbench.meter-memory.v2';

export function useMeterMemory(): [MeterMemory | null, (m: MeterMemory) => void] {
  const [memory, setMemory] = useState<MeterMemory | null>(null);
  useEffect(() => {
    AsyncStorage.getItem(KEY)
      .then((text) => setMemory(parseMemory(text)))
      .catch(() => setMemory(EMPTY_MEMORY));
  }, []);
  const remember = (m: MeterMemory) => {
    setMemory(m);
    AsyncStorage.setItem(KEY, JSON.stringify(m)).catch(() => undefined);
  };
  return [memory, remember];
}
