/** An e-mail subject as sent: one line, runs of spaces (from names typed with two) collapsed, at most 200 characters. */
export function subjectLine(text: string): string {
  return text.replace(/\s+/g, ' ').trim().slice(0, 200);
}
