// Display formatting shared by pages and sheets.
export function fmtInt(n: number | null | undefined): string {
  return n == null || !Number.isFinite(n) ? '—' : Math.round(n).toLocaleString('en-US')
}

export function fmtNum(n: number | null | undefined, digits = 2): string {
  return n == null || !Number.isFinite(n) ? '—' : n.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits })
}

// Dollars with the sign in front of the symbol: −$432.00.
export function fmtMoney(n: number | null | undefined): string {
  if (n == null || !Number.isFinite(n)) return '—'
  return `${n < 0 ? '−' : ''}$${fmtNum(Math.abs(n), 2)}`
}

export function fmtSigned(n: number | null | undefined, digits = 1): string {
  if (n == null || !Number.isFinite(n)) return '—'
  const s = n.toFixed(digits)
  return n > 0 ? `+${s}` : s
}

export function fmtDate(d: string | Date | null | undefined): string {
  if (!d) return '—'
  return new Date(d).toLocaleString('en-US', { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' })
}

// A calendar day ('2027-05-12' or a timestamp) as 'May 12, 2027'; a bare day is read as that day, not as UTC midnight.
export function fmtDay(d: string | Date | null | undefined): string {
  if (!d) return '—'
  const day = typeof d === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(d) ? new Date(`${d}T12:00:00`) : new Date(d)
  return Number.isNaN(day.getTime()) ? String(d) : day.toLocaleDateString('en-US', { year: 'numeric', month: 'short', day: 'numeric' })
}

// A stored lower-case word ('pull-type', 'no-till') as a label: first letter capitalised.
export function fmtLabel(s: string | null | undefined): string {
  return s ? s.charAt(0).toUpperCase() + s.slice(1) : '—'
}

// An amount shown as entered, up to `digits` decimals, with thousands separators: 6.5, 1,250, 387.
export function fmtQty(n: number | null | undefined, digits = 2): string {
  return n == null || !Number.isFinite(n) ? '—' : n.toLocaleString('en-US', { maximumFractionDigits: digits })
}

// The calendar day of `d` where the user is, as YYYY-MM-DD; toISOString() would give the UTC day,
// which in an American evening is already tomorrow.
export function localIsoDate(d: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0')
  return `${String(d.getFullYear()).padStart(4, '0')}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`
}

// How close a computed rate lands to its target, in a word as well as a colour: within 2 % on
// target, within 5 % worth a check, beyond that off (the bench's own bands).
export function rateStatus(errorPercent: number): { tone: 'good' | 'warn' | 'bad', word: string } {
  const off = Math.abs(errorPercent)
  if (off <= 2) return { tone: 'good', word: 'on target' }
  if (off <= 5) return { tone: 'warn', word: 'check' }
  return { tone: 'bad', word: 'off target' }
}
