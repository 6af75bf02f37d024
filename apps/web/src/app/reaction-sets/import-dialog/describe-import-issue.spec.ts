import { describeImportIssue } from './import-dialog';

describe('describeImportIssue', () => {
  it('names the place of an issue in the user’s words', () => {
    expect(describeImportIssue({ code: 'REQUEST_INVALID', message: 'Required', path: ['reactions', 2, 'equation'] })).toEqual({
      where: 'reaction 3, equation',
      message: 'Required',
    });
    expect(describeImportIssue({ code: 'REQUEST_INVALID', message: 'Bad', path: ['netReactions', 0, 'cancel', 1] }).where).toBe(
      'net reaction 1, cancelled species 2',
    );
    expect(describeImportIssue({ code: 'REQUEST_INVALID', message: 'Not a Tallus file', path: [] }).where).toBe('the file');
  });
});
