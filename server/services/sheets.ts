import { and, eq } from 'drizzle-orm'
import QRCode from 'qrcode'
import type { SetupSheet } from '#shared/types/shop'
import type { Member } from '../utils/membership'
import { getRevision } from './setups'
import { planterPickList } from './installs'
import { sheetDocument } from './sheet-document'

const { cropPlans, fields, seedPlates, farms, memberships, users } = schema


// Everything a setup sheet shows, assembled once for the PDF, the print page and the e-mail.
export async function buildSheet(farmId: number, setupId: number, revision?: number): Promise<SetupSheet> {
  const db = useDb()
  const { setup, rev, planterName } = await getRevision(farmId, setupId, revision)
  const [farm] = await db.select({ name: farms.name }).from(farms).where(eq(farms.id, farmId))
  const [planter] = await db.select().from(schema.planters).where(eq(schema.planters.id, setup.planterId))
  const plans = await db.select({ field: fields.name, acres: fields.acres, plantedAcres: cropPlans.plantedAcres, season: cropPlans.season, status: cropPlans.status })
    .from(cropPlans).innerJoin(fields, eq(fields.id, cropPlans.fieldId))
    .where(and(eq(cropPlans.farmId, farmId), eq(cropPlans.setupId, setupId)))
    .orderBy(fields.name)
  const plates = await db.select({ id: seedPlates.id, code: seedPlates.code }).from(seedPlates).where(eq(seedPlates.farmId, farmId))
  const config = rev.config
  const pickList = await planterPickList(farmId, setup.planterId, config)
  const url = appUrl(`/setups/${setupId}`)
  const qrDataUrl = await QRCode.toDataURL(url, { margin: 1, width: 240, errorCorrectionLevel: 'M' })
  const results = rev.results
  const plating = config.rowUnits.some((u) => u.granular !== 'none' || u.fertilizerSetting)
  return {
    farmName: farm?.name ?? '',
    setup: { id: setup.id, name: setup.name, crop: config.crop, installedRevision: setup.installedRevision },
    revision: { revision: rev.revision, latestRevision: setup.latestRevision, savedAt: rev.savedAt, note: rev.note },
    planter: { id: setup.planterId, name: planterName, rowCount: planter?.rowCount ?? config.rowUnits.length, frameKind: planter?.frameKind ?? null, configVersion: planter?.configVersion ?? null },
    fields: plans.map((p) => ({ name: p.field, acres: p.acres, season: p.season, status: p.status })),
    figures: {
      targetSeedsPerAcre: config.targetSeedsPerAcre,
      seedsPerAcre: results.seedsPerAcre,
      errorPercent: results.errorPercent,
      seedSpacingIn: results.seedSpacingIn,
      rowSpacingIn: config.rowSpacingIn,
      checkLengthFt: results.checkLengthFt,
      wheelCircumferenceIn: config.wheelCircumferenceIn,
      slipPercent: config.slipPercent,
    },
    sections: config.sections.map((s, i) => ({ name: s.name, rows: s.rows, plateCode: s.plateCode, stages: s.stages, seedsPerAcre: results.sections[i]?.seedsPerAcre ?? null })),
    rows: sheetRows(config, new Map(plates.map((p) => [p.id, p.code]))),
    pickList,
    warnings: results.warnings,
    chemicals: plating,
    chemicalCautions: CHEMICAL_CAUTIONS,
    machineCautions: MACHINE_CAUTIONS,
    url,
    qrDataUrl,
  }
}

let fontsReady: Promise<void> | undefined
type PdfMake = typeof import('pdfmake').default

// Inter from @fontsource (copied to server/assets/fonts) goes into pdfmake's virtual file system
// once; the renderer may then read nothing from disk or the network.
async function usePdfMake(): Promise<PdfMake> {
  const pdfmake: PdfMake = (await import('pdfmake')).default
  fontsReady ??= (async () => {
    const store = useStorage('assets:server')
    for (const w of ['400', '600']) {
      const raw = await store.getItemRaw<Buffer | Uint8Array>(`fonts/inter-latin-${w}-normal.woff`)
      if (!raw) throw new Error(`font inter-latin-${w}-normal.woff missing from server assets`)
      pdfmake.virtualfs.writeFileSync(`inter-${w}.woff`, Buffer.from(raw as Uint8Array))
    }
    pdfmake.setFonts({ Inter: { normal: 'inter-400.woff', bold: 'inter-600.woff', italics: 'inter-400.woff', bolditalics: 'inter-600.woff' } })
    pdfmake.setUrlAccessPolicy(() => false)
    pdfmake.setLocalAccessPolicy(() => false)
  })()
  await fontsReady
  return pdfmake
}

export async function sheetPdf(sheet: SetupSheet): Promise<Buffer> {
  const pdfmake = await usePdfMake()
  const doc = sheetDocument(sheet)
  return pdfmake.createPdf(doc).getBuffer()
}

export function sheetFileName(sheet: SetupSheet) {
  return `setup-sheet-${sheet.setup.name.replace(/[^\w-]+/g, '-').replace(/-+/g, '-').toLowerCase()}-rev${sheet.revision.revision}.pdf`
}

// Queues the PDF for a member of the farm (by membership id); another farm's member is a 404.
export async function sendSheet(member: Member, setupId: number, body: { memberId: number, revision?: number, message?: string | null }) {
  const sheet = await buildSheet(member.farmId, setupId, body.revision)
  const [to] = await useDb().select({ email: users.email, name: users.name }).from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.id, body.memberId), eq(memberships.farmId, member.farmId)))
  if (!to) badRequest('Choose a member of this farm', { memberId: 'Not a member of this farm' })
  const pdf = await sheetPdf(sheet)
  const subject = `Setup sheet: ${sheet.setup.name} (revision ${sheet.revision.revision})`
  const text = [
    `${member.user.name} sent you the setup sheet for ${sheet.setup.name} on ${sheet.planter.name}, revision ${sheet.revision.revision}.`,
    body.message ? `\n${body.message}\n` : '',
    `Open it in Rowbench: ${sheet.url}`,
  ].join('\n')
  await useDb().transaction(async (tx) => {
    await queueMail({ to: to.email, subject, text, farmId: member.farmId, attachments: [{ filename: sheetFileName(sheet), contentBase64: pdf.toString('base64'), contentType: 'application/pdf' }] }, tx)
    await writeAudit(tx, { farmId: member.farmId, userId: member.user.id, action: 'send-sheet', entity: 'setup', entityId: setupId, after: { revision: sheet.revision.revision, to: to.email } })
  })
  void flushOutbox()
  return { sent: true, to: to.email, revision: sheet.revision.revision, message: `The sheet is on its way to ${to.name}.` }
}
