import { fileNameOf } from './save-file';

describe('fileNameOf', () => {
  it.each([
    ['Kestrel Flats — seep survey', 'kestrel-flats-seep-survey'],
    ['***', 'export'],
  ])('names %s as %s', (title, name) => {
    expect(fileNameOf(title, 'export')).toBe(name);
  });
});
