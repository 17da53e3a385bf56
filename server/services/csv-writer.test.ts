import { parse } from 'csv-parse/sync';
import { csvCell, csvComment, csvDocument, csvRow, neutralise } from './csv-writer';

const read = (text: string): string[][] => parse(text, { relax_column_count: true }) as string[][];

/** The characters OWASP lists as the start of a formula, and the ones that change how a line splits. */
const formulaFirst = /^[=+\-@\t\r＝＋－＠]/;

const hostile = ['x,=1+1,@SUM(1)', '"quoted"', 'two\nlines', 'cr\r\nlf', "+cmd|' /C calc'!A0", '-2+3', '@import', '=HYPERLINK("http://example.com")', '\t=1', ' =1', '＝1+1', 'plain', '', "'already"];

describe('csvCell', () => {
  it('writes numbers as numbers, negative and exponent forms included, and nothing for non-finite ones', () => {
    expect(csvCell(-1.5e-6)).toBe('-0.0000015');
    expect(csvCell(-2.5e21)).toBe('-2.5e+21');
    expect(csvCell(0)).toBe('0');
    expect(csvCell(Number.NaN)).toBe('');
    expect(csvCell(Number.POSITIVE_INFINITY)).toBe('');
    expect(csvCell(null)).toBe('');
    expect(csvCell(undefined)).toBe('');
  });

  it('quotes text holding a comma, quote, CR or LF (RFC 4180), doubling quotes, and leaves other text bare', () => {
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell('a\nb')).toBe('"a\nb"');
    expect(csvCell('a\rb')).toBe('"a\rb"');
    expect(csvCell('n_per_cm3')).toBe('n_per_cm3');
  });

  it('puts an apostrophe before text a spreadsheet would run as a formula, whatever it looks like', () => {
    expect(csvCell('-2+3')).toBe("'-2+3");
    expect(csvCell('-1.5e-6')).toBe("'-1.5e-6"); // text that looks like a number is still text
    expect(csvCell('@import')).toBe("'@import");
    expect(csvCell('x,=1+1,@SUM(1)')).toBe('"x,=1+1,@SUM(1)"');
    expect(csvCell('=1+1,2')).toBe(`"'=1+1,2"`);
    expect(neutralise('\t=1')).toBe("'\t=1");
    expect(neutralise('  +1')).toBe("'  +1");
    expect(neutralise('＠SUM(1)')).toBe("'＠SUM(1)");
    expect(neutralise('a=b')).toBe('a=b');
  });
});

describe('a document read back by csv-parse', () => {
  it('gives every text cell back exactly, or with one leading apostrophe, and never a cell that starts a formula', () => {
    const rows = hostile.map((h, k) => [h, k - 2.5e-6]);
    const back = read(csvDocument({ header: ['text', 'number'], rows }));
    expect(back[0]).toEqual(['text', 'number']);
    back.slice(1).forEach((cells, k) => {
      const [text, number] = cells as [string, string];
      expect(text === hostile[k] || text === `'${hostile[k]}`).toBe(true);
      expect(text).not.toMatch(formulaFirst);
      expect(Number(number)).toBe(k - 2.5e-6);
    });
    expect(back).toHaveLength(hostile.length + 1);
  });

  it('ends every line with LF and nothing else between rows', () => {
    const text = csvDocument({ comments: [csvComment('note')], header: ['a'], rows: [[1], [2]] });
    expect(text).toBe('# note\na\n1\n2\n');
  });

  it('random text from the dangerous characters always round-trips', () => {
    const alphabet = ['=', '+', '-', '@', '\t', '\r', '\n', ',', '"', "'", ' ', 'a', '1', '.', 'e', '＝'];
    let seed = 7;
    const next = (): number => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    const texts = Array.from({ length: 500 }, () => Array.from({ length: 1 + Math.floor(next() * 8) }, () => alphabet[Math.floor(next() * alphabet.length)]).join(''));
    const back = read(texts.map((t) => csvRow([t, 'end'])).join('\n'));
    back.forEach(([cell, end], k) => {
      expect(cell === texts[k] || cell === `'${texts[k]}`).toBe(true);
      expect(cell).not.toMatch(formulaFirst);
      expect(end).toBe('end');
    });
  });
});

describe('csvComment', () => {
  it('keeps user text on one line, in its own neutralised cells, behind a first cell that starts with #', () => {
    const line = csvComment('family', 'x,=1+1,@SUM(1)\nn_per_cm3,temperature_K', '-2+3');
    expect(line).not.toMatch(/[\r\n]/);
    expect(line.startsWith('# family,')).toBe(true);
    const [cells] = read(line);
    expect(cells).toEqual(['# family', 'x,=1+1,@SUM(1) n_per_cm3,temperature_K', "'-2+3"]);
  });

  it('is skipped whole by a reader that treats # as a comment (as the upload parsers do)', () => {
    const text = csvDocument({ comments: [csvComment('source', '"open quote', 'a,"b",c')], header: ['a', 'b'], rows: [[1, 2]] });
    expect(parse(text, { comment: '#' })).toEqual([['a', 'b'], ['1', '2']]);
  });

  it('refuses a lead that could split the line: leads are the exporter\'s words, user text goes in cells', () => {
    expect(() => csvComment('name, with comma')).toThrow(/lead/);
    expect(() => csvComment('two\nlines')).toThrow(/lead/);
  });
});
