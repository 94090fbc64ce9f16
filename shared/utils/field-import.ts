import Papa from 'papaparse'
import { fieldBody, type FieldBody } from '../schemas/fields'

export interface FieldCsvRow { line: number, field: FieldBody }
export interface FieldCsvError { line: number, message: string }
export interface FieldCsvResult { rows: FieldCsvRow[], errors: FieldCsvError[], dataRows: number }

export const FIELD_CSV_MAX_ROWS = 5_000
export const FIELD_CSV_COLUMNS = ['name', 'acres', 'soil texture', 'tillage', 'drainage', 'notes'] as const

type Key = 'name' | 'acres' | 'soilTexture' | 'tillage' | 'drainage' | 'notes'
const LABEL: Record<Key, string> = { name: 'name', acres: 'acres', soilTexture: 'soil texture', tillage: 'tillage', drainage: 'drainage', notes: 'notes' }
const HEADER: Record<string, Key> = {
  'name': 'name', 'field': 'name', 'field name': 'name',
  'acres': 'acres', 'acre': 'acres', 'ac': 'acres', 'area': 'acres',
  'soil texture': 'soilTexture', 'soil': 'soilTexture', 'texture': 'soilTexture', 'soiltexture': 'soilTexture',
  'tillage': 'tillage', 'tillage system': 'tillage',
  'drainage': 'drainage', 'drainage class': 'drainage',
  'notes': 'notes', 'note': 'notes', 'comments': 'notes',
}
const TILLAGE_WORDS: Record<string, string> = {
  'conventional': 'conventional', 'conv': 'conventional', 'full': 'conventional',
  'minimum': 'minimum', 'min': 'minimum', 'min-till': 'minimum', 'minimum-till': 'minimum', 'reduced': 'minimum', 'mulch-till': 'minimum',
  'no-till': 'no-till', 'notill': 'no-till', 'no': 'no-till', 'zero-till': 'no-till', 'direct': 'no-till',
}
const ACRES = /^(\d{1,3}(,\d{3})+|\d+)(\.\d+)?$/

const headerKey = (h: string) => HEADER[h.trim().toLowerCase().replace(/[_-]+/g, ' ').replace(/\s+/g, ' ')]
const word = (v: string) => v.trim().toLowerCase().replace(/[\s_]+/g, '-')

function toField(cells: Record<Key, string | undefined>): { field?: FieldBody, message?: string } {
  const raw: Record<string, unknown> = { name: cells.name ?? '' }
  const acres = (cells.acres ?? '').replace(/\s*(ac|acres?)$/i, '').trim()
  if (acres === '') return { message: 'acres: Enter the acres' }
  if (!ACRES.test(acres)) return { message: `acres: "${acres.slice(0, 30)}" is not a number` }
  raw.acres = Number(acres.replace(/,/g, ''))
  if (cells.soilTexture) raw.soilTexture = cells.soilTexture
  if (cells.tillage) raw.tillage = TILLAGE_WORDS[word(cells.tillage)] ?? cells.tillage
  if (cells.drainage) raw.drainage = word(cells.drainage).replace(/-drained$/, '')
  if (cells.notes) raw.notes = cells.notes
  const res = fieldBody.safeParse(raw)
  if (res.success) return { field: res.data }
  const issues = res.error.issues.map((i) => `${LABEL[i.path[0] as Key] ?? i.path.join('.')}: ${i.message}`)
  return { message: [...new Set(issues)].join('; ') }
}

// The header line decides: a tab, else semicolons when they outnumber commas, else a comma.
function delimiterOf(text: string) {
  const first = text.split('\n').find((l) => l.trim() !== '') ?? ''
  if (first.includes('\t')) return '\t'
  const count = (c: string) => first.split(c).length - 1
  return count(';') > count(',') ? ';' : ','
}

// Reads a field list (a header line, then one field a line; comma, semicolon or tab). Every bad
// row is reported with its line in the file, counting from 1 at the header; names repeated in the
// file or already on the farm are bad rows.
export function parseFieldCsv(input: string, existingNames: readonly string[] = []): FieldCsvResult {
  const text = input.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n')
  const out: FieldCsvResult = { rows: [], errors: [], dataRows: 0 }
  const records: { line: number, cells: string[], quoteError: boolean }[] = []
  // A record starts on the line after the newlines before it; counted as the cursor moves.
  let start = 0
  let line = 1
  Papa.parse<string[]>(text, {
    newline: '\n',
    delimiter: delimiterOf(text),
    skipEmptyLines: false,
    step: (r) => {
      records.push({ line, cells: r.data, quoteError: r.errors.some((e) => e.type === 'Quotes') })
      for (let i = start; i < r.meta.cursor; i++) if (text.charCodeAt(i) === 10) line++
      start = r.meta.cursor
    },
  })
  const nonEmpty = records.filter((r) => r.cells.some((c) => c.trim() !== ''))
  const header = nonEmpty[0]
  if (!header) {
    out.errors.push({ line: 1, message: 'The file is empty; the first line names the columns' })
    return out
  }
  const keys = header.cells.map(headerKey)
  const unknown = header.cells.filter((c, i) => !keys[i] && c.trim() !== '')
  const missing = (['name', 'acres'] as Key[]).filter((k) => !keys.includes(k))
  const doubled = keys.filter((k, i) => k && keys.indexOf(k) !== i)
  if (unknown.length || missing.length || doubled.length) {
    const parts = [
      missing.length ? `Missing column${missing.length > 1 ? 's' : ''} ${missing.map((k) => `"${LABEL[k]}"`).join(' and ')}` : '',
      unknown.length ? `Unknown column${unknown.length > 1 ? 's' : ''} ${unknown.map((c) => `"${c.trim().slice(0, 30)}"`).join(', ')}` : '',
      doubled.length ? `Column "${LABEL[doubled[0]!]}" appears twice` : '',
    ].filter(Boolean)
    out.errors.push({ line: header.line, message: `${parts.join('; ')}. The columns are: ${FIELD_CSV_COLUMNS.join(', ')}` })
    return out
  }
  const data = nonEmpty.slice(1)
  out.dataRows = data.length
  if (data.length > FIELD_CSV_MAX_ROWS) {
    out.errors.push({ line: data[FIELD_CSV_MAX_ROWS]!.line, message: `The file has ${data.length} fields; import at most ${FIELD_CSV_MAX_ROWS} at a time` })
    return out
  }
  const onFarm = new Set(existingNames.map((n) => n.trim().toLowerCase()))
  const seen = new Map<string, number>()
  for (const rec of data) {
    if (rec.quoteError) {
      out.errors.push({ line: rec.line, message: 'A quoted value is not closed; check the quotation marks' })
      continue
    }
    if (rec.cells.length > keys.length && rec.cells.slice(keys.length).some((c) => c.trim() !== '')) {
      out.errors.push({ line: rec.line, message: `This line has ${rec.cells.length} values; the header has ${keys.length} columns` })
      continue
    }
    const cells = {} as Record<Key, string | undefined>
    keys.forEach((k, i) => { if (k) cells[k] = rec.cells[i]?.trim() })
    const { field, message } = toField(cells)
    if (!field) {
      out.errors.push({ line: rec.line, message: message! })
      continue
    }
    const key = field.name.toLowerCase()
    if (seen.has(key)) {
      out.errors.push({ line: rec.line, message: `name: "${field.name}" is also on line ${seen.get(key)}` })
      continue
    }
    seen.set(key, rec.line)
    if (onFarm.has(key)) {
      out.errors.push({ line: rec.line, message: `name: a field named "${field.name}" is already on this farm` })
      continue
    }
    out.rows.push({ line: rec.line, field })
  }
  return out
}
