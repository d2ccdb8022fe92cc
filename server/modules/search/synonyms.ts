/** The trade's synonyms live with the parameter classifier (lib/specs/synonyms.ts); the search index reads them here. */
export { SYNONYM_GROUPS } from '@/lib/specs/synonyms';
