import { splitLinks } from './split-links';

describe('splitLinks', () => {
  it('finds an invitation link inside plain text and leaves sentence punctuation outside', () => {
    const text = 'Join us:\nhttp://127.0.0.1:4300/invitations/accept?token=abc_12-x.\nThanks';

    expect(splitLinks(text)).toEqual([
      { text: 'Join us:\n', isLink: false },
      { text: 'http://127.0.0.1:4300/invitations/accept?token=abc_12-x', isLink: true },
      { text: '.\nThanks', isLink: false },
    ]);
  });

  it('keeps text without links whole', () => {
    expect(splitLinks('No links here.')).toEqual([{ text: 'No links here.', isLink: false }]);
  });

  it('never treats other schemes as links', () => {
    expect(splitLinks('javascript:alert(1)').every((part) => !part.isLink)).toBe(true);
  });
});
