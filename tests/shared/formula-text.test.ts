import { describe, expect, it } from 'vitest';
import { escapeCsvCell } from '../../shared/price-list/csv-escape';
import { defuseFormula, formulaSign, isDefusedFormula, startsLikeFormula } from '../../shared/price-list/formula-text';

describe('formula-leading text', () => {
  it('knows the starters OWASP lists for CSV injection: = + - @, tab and CR', () => {
    for (const v of ['=HYPERLINK("http://x","y")', '+1+2', '-2+3', '@SUM(A1:A2)', '\t=1', '\r=1', '  =1+1', '＝1', '－1']) {
      expect(startsLikeFormula(v), JSON.stringify(v)).toBe(true);
    }
  });

  it('leaves ordinary text, and dashes written for "none", alone', () => {
    for (const v of ['Ignition coil', 'QW-IC 3140', '3-pin', '-', '--', ' - ', 'a=b', 'e-mail@x']) {
      expect(startsLikeFormula(v), JSON.stringify(v)).toBe(false);
    }
  });

  it('defuses with a leading apostrophe, which the CSV export then leaves as it is', () => {
    const formula = '=HYPERLINK("http://x","y")';
    const defused = defuseFormula(formula);
    expect(defused).toBe(`'${formula}`);
    expect(isDefusedFormula(defused)).toBe(true);
    expect(isDefusedFormula("'quoted words")).toBe(false);
    // One apostrophe, not two: the export sees text that no longer starts like a formula.
    expect(escapeCsvCell(defused)).toBe(`"'=HYPERLINK(""http://x"",""y"")"`);
    expect(formulaSign('  @SUM(A1)')).toBe('@');
  });
});
