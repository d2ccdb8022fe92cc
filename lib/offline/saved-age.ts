/** "Offline — showing what was saved 2 h ago": how old the kept copy is, in words. */
export function savedAgo(savedAt: number, now: number): string {
  const s = Math.max(0, Math.round((now - savedAt) / 1000));
  if (s < 60) return 'just now';
  const min = Math.floor(s / 60);
  if (min < 60) return `${min} min ago`;
  const h = Math.floor(min / 60);
  if (h < 48) return `${h} h ago`;
  return `${Math.floor(h / 24)} days ago`;
}

export function offlineLine(savedAt: number | null, now: number): string {
  return savedAt === null
    ? 'Offline — nothing is saved on this device yet'
    : `Offline — showing what was saved ${savedAgo(savedAt, now)}`;
}
