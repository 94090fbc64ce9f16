import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { fmtDay, fmtInt, fmtLabel, fmtMoney, fmtQty, localIsoDate, rateStatus } from '../../shared/utils/format'

// Display formatting only (no published source needed): en-US month names and separators.
describe('fmtDay', () => {
  it('reads a bare day as that calendar day in any time zone', () => {
    expect(fmtDay('2027-05-12')).toBe('May 12, 2027')
    expect(fmtDay('2026-01-01')).toBe('Jan 1, 2026')
  })
  it('shows a dash for no day and keeps text it cannot read', () => {
    expect(fmtDay(null)).toBe('—')
    expect(fmtDay('')).toBe('—')
    expect(fmtDay('someday')).toBe('someday')
  })
})

describe('fmtQty', () => {
  it('keeps entered decimals up to the limit, with thousands separators', () => {
    expect(fmtQty(6.5)).toBe('6.5')
    expect(fmtQty(387)).toBe('387')
    expect(fmtQty(1250.125)).toBe('1,250.13')
    expect(fmtQty(null)).toBe('—')
  })
})

describe('fmtLabel and fmtInt', () => {
  it('capitalises a stored word and leaves the rest alone', () => {
    expect(fmtLabel('pull-type')).toBe('Pull-type')
    expect(fmtLabel('fine sandy loam')).toBe('Fine sandy loam')
    expect(fmtLabel(null)).toBe('—')
  })
  it('rounds whole numbers with separators', () => {
    expect(fmtInt(138963.4)).toBe('138,963')
  })
})

describe('fmtMoney', () => {
  it('puts the sign before the dollar symbol and keeps cents', () => {
    expect(fmtMoney(-432)).toBe('−$432.00')
    expect(fmtMoney(1234.5)).toBe('$1,234.50')
    expect(fmtMoney(null)).toBe('—')
  })
})

describe('localIsoDate', () => {
  const zone = process.env.TZ
  beforeEach(() => { process.env.TZ = 'America/Chicago' })
  afterEach(() => {
    if (zone === undefined) delete process.env.TZ
    else process.env.TZ = zone
  })

  it('keeps a late-evening moment on its own local day', () => {
    expect(localIsoDate(new Date(2027, 4, 12, 23, 30))).toBe('2027-05-12')
    expect(localIsoDate(new Date(2026, 11, 31, 23, 59))).toBe('2026-12-31')
    expect(localIsoDate(new Date(2026, 0, 1, 0, 5))).toBe('2026-01-01')
  })

  it('gives the local day where the UTC day has already turned (22:30 CDT is 03:30 UTC the next day)', () => {
    const evening = new Date('2027-05-13T03:30:00Z')
    expect(evening.toISOString().slice(0, 10)).toBe('2027-05-13')
    expect(localIsoDate(evening)).toBe('2027-05-12')
  })

  it('defaults to now', () => {
    vi.useFakeTimers({ now: new Date(2027, 4, 12, 23, 30) })
    try {
      expect(localIsoDate()).toBe('2027-05-12')
    } finally {
      vi.useRealTimers()
    }
  })
})

describe('rateStatus', () => {
  it('names the band in a word beside its tone, the same on either side of the target', () => {
    expect(rateStatus(0)).toEqual({ tone: 'good', word: 'on target' })
    expect(rateStatus(-2)).toEqual({ tone: 'good', word: 'on target' })
    expect(rateStatus(2.01)).toEqual({ tone: 'warn', word: 'check' })
    expect(rateStatus(-5)).toEqual({ tone: 'warn', word: 'check' })
    expect(rateStatus(5.5)).toEqual({ tone: 'bad', word: 'off target' })
    expect(rateStatus(-23.5)).toEqual({ tone: 'bad', word: 'off target' })
  })
})
