import type { SetupSheet } from '#shared/types/shop'

const TEAL = '#0f766e'
const GRAPHITE = '#25282d'
const MUTED = '#5b6270'

// pdfmake document for a setup sheet: US Letter landscape, Inter, real text throughout. The latin
// subset of Inter has no arrows, so the PDF says "to" where the page shows one.
export function sheetDocument(s: SetupSheet) {
  const f = s.figures
  const fieldsLine = s.fields.length ? s.fields.map((x) => `${x.name} (${fmtNum(x.acres, 1)} ac)`).join(', ') : 'no field planned with this setup yet'
  const facts: [string, string][] = [
    ['Farm', s.farmName],
    ['Planter', `${s.planter.name} · ${s.planter.rowCount} rows at ${f.rowSpacingIn} in`],
    ['Crop', s.setup.crop],
    ['Field(s)', fieldsLine],
    ['Target population', `${fmtInt(f.targetSeedsPerAcre)} seeds/acre`],
    ['Computed population', `${fmtInt(f.seedsPerAcre)} seeds/acre (${fmtSigned(f.errorPercent)} %)`],
    ['Seed spacing', `${fmtNum(f.seedSpacingIn, 2)} in`],
    ['1/1000-acre check length', `${fmtNum(f.checkLengthFt, 1)} ft of row`],
    ['Drive wheel', `${f.wheelCircumferenceIn} in rolling circumference, ${f.slipPercent} % slip`],
  ]
  // Codes and gear pairs stay on one line so the printed table (and its text) keeps them whole.
  const NO_WRAP = new Set(['row', 'plate', 'sprockets', 'downPressure', 'pressWheel', 'granular'])
  const cell = (text: string, key: string) => ({ text, bold: key === 'row', fontSize: 8, noWrap: NO_WRAP.has(key) })
  const rowTable = {
    table: {
      headerRows: 1,
      widths: ['auto', 'auto', 'auto', 'auto', 'auto', 'auto', '*', 'auto', 'auto', '*'],
      body: [
        SHEET_COLUMNS.map((c) => ({ text: c.label, bold: true, fontSize: 8, color: 'white', fillColor: GRAPHITE })),
        ...s.rows.map((r) => SHEET_COLUMNS.map((c) => cell(String(r[c.key]), c.key))),
      ],
    },
    layout: { hLineColor: '#d4d7dd', vLineColor: '#d4d7dd', fillColor: (i: number) => (i > 0 && i % 2 === 0 ? '#f3f4f6' : null) },
  }
  const pl = s.pickList
  const pickLines = [
    ...[...pl.plates, ...pl.sprockets].map((l) => `${l.kind === 'plate' ? 'Plate' : 'Sprocket'} ${l.label}: pull ${l.pull}, put back ${l.putBack} · on the shelf ${l.onHand}, then ${l.after}${l.short ? ` · SHORT ${l.short}` : ''}`),
    ...pl.parts.map((p) => `${p.part}: ${p.from} to ${p.to} on rows ${p.rows.join(', ')}`),
    ...pl.adjustments.map((p) => `Set ${p.part.toLowerCase()}: ${p.from} to ${p.to} on rows ${p.rows.join(', ')}`),
    ...pl.blockers,
  ]
  const signLine = (label: string) => ({ stack: [{ canvas: [{ type: 'line', x1: 0, y1: 18, x2: 200, y2: 18, lineWidth: 0.6, lineColor: GRAPHITE }] }, { text: label, fontSize: 8, color: MUTED, margin: [0, 2, 0, 0] }] })
  return {
    pageSize: 'LETTER',
    pageOrientation: 'landscape',
    pageMargins: [32, 32, 32, 40],
    info: { title: `Setup sheet · ${s.setup.name} · revision ${s.revision.revision}`, author: 'Rowbench', subject: `${s.planter.name} ${s.setup.crop}` },
    defaultStyle: { font: 'Inter', fontSize: 9, color: GRAPHITE },
    footer: (page: number, pages: number) => ({ text: `${s.setup.name} · revision ${s.revision.revision} · page ${page} of ${pages}`, alignment: 'center', fontSize: 7, color: MUTED }),
    content: [
      {
        columns: [
          { width: '*', stack: [
            { text: 'SETUP SHEET', fontSize: 8, color: TEAL, bold: true },
            { text: s.setup.name, fontSize: 18, bold: true },
            { text: `Revision ${s.revision.revision} of ${s.revision.latestRevision} · saved ${fmtDate(s.revision.savedAt)}`, color: MUTED },
            ...(s.revision.note ? [{ text: `“${s.revision.note}”`, italics: true, color: MUTED }] : []),
          ] },
          { width: 80, stack: [{ image: s.qrDataUrl, width: 72 }, { text: 'Open in Rowbench', fontSize: 6, color: MUTED }] },
        ],
      },
      { margin: [0, 8, 0, 8], table: { widths: [130, '*'], body: facts.map(([k, v]) => [{ text: k, color: MUTED }, { text: v, bold: true }]) }, layout: 'noBorders' },
      ...(s.warnings.length ? [{ text: s.warnings.join(' '), color: '#92400e', margin: [0, 0, 0, 6] }] : []),
      { text: 'Row by row', bold: true, fontSize: 11, margin: [0, 4, 0, 4] },
      rowTable,
      { text: 'Parts to pull', bold: true, fontSize: 11, margin: [0, 10, 0, 4] },
      pl.unchanged ? { text: 'The planter already carries this setup; nothing to pull.', color: MUTED } : { ul: pickLines, fontSize: 8 },
      {
        margin: [0, 10, 0, 0],
        table: { widths: ['*'], body: [[{
          fillColor: '#fffbeb',
          stack: [
            { text: 'Chemicals and the machine: read before you start', bold: true, margin: [0, 0, 0, 3] },
            { ul: [...s.chemicalCautions, ...s.machineCautions], fontSize: 8 },
          ],
        }]] },
        layout: { hLineColor: '#fcd34d', vLineColor: '#fcd34d' },
      },
      { margin: [0, 18, 0, 0], columns: [signLine('Prepared by'), signLine('Checked by'), signLine('Date')] },
    ],
  }
}
