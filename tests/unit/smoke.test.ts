import { describe, expect, it } from 'vitest'
import Decimal from 'decimal.js'

describe('decimal', () => {
  it('adds exactly', () => {
    expect(new Decimal('0.1').plus('0.2').toString()).toBe('0.3')
  })
})
