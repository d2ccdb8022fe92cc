/** "the new job" → "The new job". */
export const capitalised = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
