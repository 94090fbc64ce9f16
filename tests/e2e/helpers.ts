import { deflateSync } from 'node:zlib'
import { expect, type Page } from '@playwright/test'
import { defaultSeason } from '../../shared/utils/season'

export const DEMO_PASSWORD = 'rowbench-demo'
// The demo seeds the season being planned and the one before it, planted (scripts/seed/plans.ts).
export const DEMO_SEASON = defaultSeason()
export const LAST_SEASON = DEMO_SEASON - 1

export async function signIn(page: Page, role: 'owner' | 'agronomist' | 'operator' | 'foreman') {
  await page.goto('/login')
  await page.getByLabel('E-mail').fill(`${role}@demo.test`)
  await page.getByLabel('Password').fill(DEMO_PASSWORD)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByTestId('role-badge')).toBeVisible()
}

export async function signOut(page: Page) {
  await page.getByTestId('user-menu').click()
  await page.getByRole('menuitem', { name: 'Sign out' }).click()
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible()
}

// A real 8 × 8 PNG, made here so the browser can draw the thumbnail: signature, IHDR, IDAT, IEND,
// each chunk with its CRC-32 (PNG specification, ISO/IEC 15948).
export function pngFixture(rgb: [number, number, number]): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1
    return c >>> 0
  })
  const crc = (b: Buffer) => {
    let c = 0xffffffff
    for (const x of b) c = crcTable[(c ^ x) & 0xff]! ^ (c >>> 8)
    return (c ^ 0xffffffff) >>> 0
  }
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data])
    const out = Buffer.alloc(body.length + 8)
    out.writeUInt32BE(data.length, 0)
    body.copy(out, 4)
    out.writeUInt32BE(crc(body), body.length + 4)
    return out
  }
  const size = 8
  const ihdr = Buffer.alloc(13)
  ihdr.writeUInt32BE(size, 0)
  ihdr.writeUInt32BE(size, 4)
  ihdr.set([8, 2, 0, 0, 0], 8) // 8-bit RGB, no interlace
  const row = Buffer.concat([Buffer.from([0]), Buffer.from(Array.from({ length: size }, () => rgb).flat())])
  const pixels = Buffer.concat(Array.from({ length: size }, () => row))
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(pixels)), chunk('IEND', Buffer.alloc(0))])
}
