import { fileNameOf, toCsv } from './save-file';

describe('toCsv', () => {
  it('quotes cells with commas, quotes and line breaks, and leaves missing values empty', () => {
    expect(toCsv(['phase', 'transfer (mmol/kg)'], [['plagioclase, An38', '1/5'], ['say "hi"', null]])).toBe(
      'phase,transfer (mmol/kg)\r\n"plagioclase, An38",1/5\r\n"say ""hi""",\r\n',
    );
  });
});

describe('fileNameOf', () => {
  it.each([
    ['Kestrel Flats — seep survey', 'kestrel-flats-seep-survey'],
    ['***', 'export'],
  ])('names %s as %s', (title, name) => {
    expect(fileNameOf(title, 'export')).toBe(name);
  });
});
