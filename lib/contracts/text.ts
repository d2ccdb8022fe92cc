/**
 * Free text, one rule for every field of every request and for the CSV cells: trimmed,
 * a length limit, and none of the characters that hide or disguise what is stored.
 *  - C0 control characters (NUL, escape, bell …), DEL and the C1 controls: invisible, and
 *    NUL ends strings in other tools. Tab and line breaks only where a field may span lines.
 *  - Bidirectional embeddings, overrides and isolates (U+202A–U+202E, U+2066–U+2069): they
 *    reorder how the text is shown, so a page can read differently from what is stored
 *    (CVE-2021-42574, "Trojan Source"; Unicode UAX #9 lists them as the explicit formatting
 *    characters). The implicit marks LRM/RLM stay allowed: they reorder nothing on their own.
 *  - A lone UTF-16 surrogate: half a character; MariaDB's JSON check refuses it (a 500
 *    before this rule), and it cannot be written as UTF-8 at all.
 * Single-line fields also refuse U+2028/U+2029, which some viewers show as line breaks.
 */
import { z } from 'zod';

const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
const TAB_OR_BREAK = /[\t\r\n\u2028\u2029]/;
const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export type TextRule = { multiline?: boolean };

/** What is wrong with `s` as free text ("contains …", "must …"), or null when nothing is. */
export function textProblem(s: string, { multiline = false }: TextRule = {}): string | null {
  if (LONE_SURROGATE.test(s)) return 'contains a broken character (half of a UTF-16 pair); retype it';
  if (CONTROL.test(s)) return 'contains an invisible control character; retype it';
  if (BIDI_CONTROL.test(s)) return 'contains a character that reverses the text direction; remove it';
  if (!multiline && TAB_OR_BREAK.test(s)) return 'must fit on one line, without tabs';
  return null;
}

/** `label` then the problem, or the problem as a sentence of its own when there is no label. */
const say = (label: string | undefined, problem: string) =>
  label ? `${label} ${problem}` : problem.charAt(0).toUpperCase() + problem.slice(1);

/**
 * A trimmed string of at most `max` characters that passes textProblem. Chain .min(),
 * .refine(), .optional() or .default() as the field needs; the messages start with `label`
 * (for a field shown under its own name in a form, leave it out: "At most 80 characters");
 * `error` replaces the message for a value that is missing or not a string.
 */
export function safeText(
  max: number,
  { label, multiline = false, error }: TextRule & { label?: string; error?: string } = {},
) {
  return z
    .string({ error: error ?? say(label, 'must be text') })
    .trim()
    .max(max, label ? `${label} is too long; the limit is ${max} characters` : `At most ${max} characters`)
    .superRefine((s, ctx) => {
      const problem = textProblem(s, { multiline });
      if (problem) ctx.addIssue({ code: 'custom', message: say(label, problem) });
    });
}
