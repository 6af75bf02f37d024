// Source of the checked reaction: complete pyrite oxidation, Itasca Denver report to Colorado DRMS, eq. 3.1
// (coefficients 15/4 O2, 7/2 H2O, 4 H+); the rest checks notation, not chemistry.
import { equationParts } from './equation-parts';

describe('equationParts', () => {
  it('renders subscripts, charges and exact fractions of the complete pyrite oxidation (Itasca eq. 3.1)', () => {
    const view = equationParts('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
    expect(view.isParsed).toBe(true);
    if (!view.isParsed) return;
    expect(view.arrow).toBe('→');
    expect(view.left.map((term) => term.coefficient)).toEqual([null, '15/4', '7/2']);
    expect(view.right.map((term) => term.coefficient)).toEqual([null, '2', '4']);
    expect(view.right[1].parts).toEqual([
      { kind: 'text', text: 'SO' },
      { kind: 'subscript', text: '4' },
      { kind: 'superscript', text: '2-' },
    ]);
  });

  it('keeps decimals as the user wrote them and shows the reversible arrow', () => {
    const view = equationParts('Na0.62Ca0.38Al1.38Si2.62O8 + 1.38 H+ <=> 0.69 Al2Si2O5(OH)4');
    if (!view.isParsed) throw new Error('should parse');
    expect(view.arrow).toBe('⇌');
    expect(view.left[1].coefficient).toBe('1.38');
    expect(view.right[0].coefficient).toBe('0.69');
    expect(view.left[0].parts[1]).toEqual({ kind: 'subscript', text: '0.62' });
  });

  it('returns text that does not parse as it is', () => {
    expect(equationParts('FeS2 + O2')).toEqual({ isParsed: false, text: 'FeS2 + O2' });
  });
});
