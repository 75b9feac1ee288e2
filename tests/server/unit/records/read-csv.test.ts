// The upload reader against an independent CSV implementation: tables written by d3-dsv (which
// quotes per RFC 4180 §2) must read back cell for cell, whatever the separator.
import { dsvFormat } from 'd3-dsv';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readCsv } from '../../../../server/records/read-csv';

// Cells may hold quotes, all three separators and line breaks; a leading # would start a
// comment line, which is the reader's documented rule, so cells start with something else.
const cell = fc
  .string({
    unit: fc.constantFrom('a', 'Z', '7', ' ', '.', '"', ',', ';', '\t', '\n', 'é', '°', '#'),
    maxLength: 8,
  })
  .map((s) => `x${s}`);

describe('readCsv', () => {
  it('reads back what d3-dsv writes, for comma, semicolon and tab files', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(',', ';', '\t'),
        fc.integer({ min: 2, max: 5 }).chain((width) =>
          fc.tuple(
            fc.array(cell, { minLength: width, maxLength: width }),
            fc.array(fc.array(cell, { minLength: width, maxLength: width }), {
              minLength: 1,
              maxLength: 6,
            }),
          ),
        ),
        (delimiter, [header, rows]) => {
          // Header cells without quotes or separators, as a header line is (the separator is detected there).
          const names = header.map((_, i) => `col${i}`);
          const text = dsvFormat(delimiter).formatRows([names, ...rows]);
          const read = readCsv(Buffer.from(`# a comment line\n${text}\n`, 'utf8'));
          expect(read.ok).toBe(true);
          if (!read.ok) return;
          expect(read.table.delimiter).toBe(delimiter);
          expect(read.table.headers).toEqual(names);
          expect(read.table.records.map((r) => r.cells)).toEqual(rows);
        },
      ),
      { seed: 20261201, numRuns: 200 },
    );
  });

  it('gives each record the file line it ends on, counting comments and quoted line breaks', () => {
    const read = readCsv(Buffer.from('# one\n# two\na,b\n1,2\n"3\nstill 3",4\n\n5,6\n'));
    expect(read.ok && read.table.records.map((r) => r.line)).toEqual([4, 6, 8]);
  });
});
