// Source: the oxide values are invented input; the checks are about reading pasted text (headers, decimal commas,
// line and column of each problem), not about chemistry.
import { readPastedOxides } from './oxide-paste';

describe('readPastedOxides', () => {
  it('reads a header row over a row of values and skips the sample and total columns', () => {
    const pasted = readPastedOxides('sample,SiO2,Al2O3,CaO,Na2O,total\nKF-PL-1,55.62,28.06,7.70,6.96,98.34');
    expect(pasted.oxides).toEqual({ SiO2: 55.62, Al2O3: 28.06, CaO: 7.7, Na2O: 6.96 });
    expect(pasted.problems).toEqual([]);
  });

  it('reads one oxide per line, tab or space separated, with decimal commas', () => {
    expect(readPastedOxides('SiO2\t34,96\nFeO 36.77\nMgO;27.04').oxides).toEqual({ SiO2: 34.96, FeO: 36.77, MgO: 27.04 });
  });

  it('places each problem by line and column', () => {
    const pasted = readPastedOxides('SiO2,Al2O3,Xy2O\n55.6,n.d.,1');
    expect(pasted.oxides).toEqual({ SiO2: 55.6 });
    expect(pasted.problems).toEqual([
      { line: 2, column: 2, message: 'Al2O3: “n.d.” is no weight percent from 0 to 100.' },
      { line: 1, column: 3, message: expect.stringContaining('“Xy2O” is no oxide') },
    ]);
  });
});
