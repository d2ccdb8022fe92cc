import { subjectLine } from '@/server/modules/mail/subject';

describe('subjectLine', () => {
  it('collapses double spaces, tabs and line breaks into one space', () => {
    expect(subjectLine('Correction #4 to review: Spark plug  cap\t gap\n')).toBe(
      'Correction #4 to review: Spark plug cap gap',
    );
  });
  it('keeps at most 200 characters', () => {
    expect(subjectLine(`a ${'b'.repeat(300)}`)).toHaveLength(200);
  });
});
