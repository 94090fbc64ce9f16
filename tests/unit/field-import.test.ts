import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { parseFieldCsv } from '../../shared/utils/field-import'

// Invented field lists for the importer; line numbers count the header as line 1.
describe('field list CSV', () => {
  it('reads a clean file with every column, normalising tillage and drainage words', () => {
    const r = parseFieldCsv('Name,Acres,Soil texture,Tillage,Drainage,Notes\nNorth Bend,"1,204.5",silt loam,No Till,Well drained,"wet corner, east"\nMill Lot,40 ac,,min-till,tiled,\n')
    expect(r.errors).toEqual([])
    expect(r.dataRows).toBe(2)
    expect(r.rows).toEqual([
      { line: 2, field: { name: 'North Bend', acres: 1204.5, soilTexture: 'silt loam', tillage: 'no-till', drainage: 'well', notes: 'wet corner, east' } },
      { line: 3, field: { name: 'Mill Lot', acres: 40, tillage: 'minimum', drainage: 'tiled' } },
    ])
  })

  it('defaults tillage to conventional and takes semicolons, tabs, CRLF and a BOM', () => {
    expect(parseFieldCsv('\uFEFFname;acres\r\nA;12,5\r\n').errors).toEqual([{ line: 2, message: 'acres: "12,5" is not a number' }])
    const t = parseFieldCsv('field\tarea\nA\t12.5\n')
    expect(t.rows).toEqual([{ line: 2, field: { name: 'A', acres: 12.5, tillage: 'conventional' } }])
  })

  it('reports every bad row by its line, skipping blank lines and counting quoted line breaks', () => {
    const csv = [
      'name,acres,tillage,notes', // 1
      'Good One,80,no-till,', // 2
      '', // 3
      ',40,,', // 4 no name
      'Bad Acres,lots,,', // 5
      'Too Big,200000,,', // 6
      'Plowed,50,chisel,', // 7
      'Quoted,60,,"two', // 8
      'lines"', // 9
      'good one,30,,', // 10 duplicate of line 2 (case differs)
      'Extra,30,,,surplus', // 11
      'Last,0,,', // 12
    ].join('\n')
    const r = parseFieldCsv(csv)
    expect(r.rows.map((x) => [x.line, x.field.name])).toEqual([[2, 'Good One'], [8, 'Quoted']])
    expect(r.rows[1]!.field.notes).toBe('two\nlines')
    expect(r.errors).toEqual([
      { line: 4, message: 'name: Enter a name' },
      { line: 5, message: 'acres: "lots" is not a number' },
      { line: 6, message: 'acres: Acres must be from 0.01 to 100,000 ac' },
      { line: 7, message: 'tillage: Choose conventional, minimum or no-till' },
      { line: 10, message: 'name: "good one" is also on line 2' },
      { line: 11, message: 'This line has 5 values; the header has 4 columns' },
      { line: 12, message: 'acres: Acres must be from 0.01 to 100,000 ac' },
    ])
    expect(r.dataRows).toBe(9)
  })

  it('names already on the farm are bad rows', () => {
    const r = parseFieldCsv('name,acres\nEast Forty,40\nWest Forty,40\n', ['east forty'])
    expect(r.errors).toEqual([{ line: 2, message: 'name: a field named "East Forty" is already on this farm' }])
    expect(r.rows).toHaveLength(1)
  })

  it('a header without the required columns or with unknown ones stops at line 1', () => {
    expect(parseFieldCsv('title,size\nA,1\n').errors).toEqual([{ line: 1, message: 'Missing columns "name" and "acres"; Unknown columns "title", "size". The columns are: name, acres, soil texture, tillage, drainage, notes' }])
    expect(parseFieldCsv('name,acres,name\n').errors[0]!.message).toMatch(/Column "name" appears twice/)
    expect(parseFieldCsv('\n\n').errors).toEqual([{ line: 1, message: 'The file is empty; the first line names the columns' }])
  })

  it('an unclosed quote is reported on the line where it starts', () => {
    const r = parseFieldCsv('name,acres\nA,1\nB,"2\nC,3\n')
    expect(r.rows.map((x) => x.line)).toEqual([2])
    expect(r.errors).toEqual([{ line: 3, message: 'A quoted value is not closed; check the quotation marks' }])
  })

  it('never throws and every input line is a row or an error (property)', () => {
    fc.assert(fc.property(fc.array(fc.tuple(fc.string({ maxLength: 12 }), fc.oneof(fc.double(), fc.string({ maxLength: 6 }))), { maxLength: 30 }), (rows) => {
      const csv = ['name,acres', ...rows.map(([n, a]) => `${n.replace(/[",\n\r\t;]/g, '')},${String(a).replace(/[",\n\r\t;]/g, '')}`)].join('\n')
      const r = parseFieldCsv(csv)
      expect(r.rows.length + r.errors.length).toBe(r.dataRows)
    }), { numRuns: 200 })
  })
})
