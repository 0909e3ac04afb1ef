import ExcelJS from 'exceljs';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { toCsv, toXlsx, type Table } from '../../../../server/services/reports/exportsFormat.js';

const hostile = ['=1+1', '+SUM(A1)', '-2+3', '@cmd', '\tx', '\rx', '＝1', 'plain', 'a,"b"'];
const table: Table = {
  sheet: 'T',
  headers: ['Tray', 'Section'],
  rows: [...hostile.map((s, i) => [i + 1, s]), [-1.5, null], [Infinity, 'x']],
  notes: ['=note'],
};

describe('CSV export neutralises formulas', () => {
  const rows: string[][] = parse(toCsv(table).toString('utf8'), { relax_column_count: true });

  it('text cells starting with = + - @ TAB or CR (and full-width forms) get a leading apostrophe', () => {
    const cells = rows.slice(2, 2 + hostile.length).map((r) => r[1]);
    expect(cells).toEqual(["'=1+1", "'+SUM(A1)", "'-2+3", "'@cmd", "'\tx", "'\rx", "'＝1", 'plain', 'a,"b"']);
  });

  it('numbers stay numbers (negative ones too); empty and non-finite values are empty cells; notes lead with #', () => {
    expect(rows[0]).toEqual(['# =note']);
    expect(rows[1]).toEqual(['Tray', 'Section']);
    expect(rows.at(-2)).toEqual(['-1.5', '']);
    expect(rows.at(-1)).toEqual(['', 'x']);
  });

  it('uses CRLF line ends', () => {
    expect(toCsv(table).toString('utf8')).toMatch(/^# =note\r\nTray,Section\r\n/);
  });
});

describe('XLSX export keeps text as text', () => {
  it('a cell that looks like a formula is stored as a string, never as a formula', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await toXlsx(table)) as unknown as ArrayBuffer);
    const ws = wb.getWorksheet('T')!;
    for (let i = 0; i < hostile.length; i++) {
      const cell = ws.getRow(i + 2).getCell(2);
      expect(cell.type).toBe(ExcelJS.ValueType.String);
      expect(cell.value).toBe(hostile[i]!.replace(/\r/g, '\n')); // XML stores a CR as a line feed
    }
    expect(ws.getRow(hostile.length + 2).getCell(1).value).toBe(-1.5);
  });
});
