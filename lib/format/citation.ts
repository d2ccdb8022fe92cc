/**
 * How a cited source reads wherever it is shown or mailed: "Title, edition, p. 7-12".
 * The edition is left out when it is empty.
 */
export type CitedSourceName = { title: string; edition?: string | null };

/** "Title, edition", or "Title" alone. */
export const sourceName = (s: CitedSourceName): string => (s.edition ? `${s.title}, ${s.edition}` : s.title);

/** "Title, edition, p. 7-12"; without a page, "Title, edition". */
export const citationText = (s: CitedSourceName, page: string | null | undefined): string =>
  page ? `${sourceName(s)}, p. ${page}` : sourceName(s);
