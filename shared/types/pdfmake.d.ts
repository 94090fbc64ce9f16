// pdfmake 0.3 ships no types; the little of its server API that the setup sheet uses.
declare module 'pdfmake' {
  interface PdfMakeServer {
    virtualfs: { writeFileSync(name: string, data: Buffer): void }
    setFonts(fonts: Record<string, { normal: string, bold: string, italics: string, bolditalics: string }>): void
    setUrlAccessPolicy(policy: (url: string) => boolean): void
    setLocalAccessPolicy(policy: (path: string) => boolean): void
    createPdf(doc: Record<string, unknown>): { getBuffer(): Promise<Buffer> }
  }
  const pdfmake: PdfMakeServer
  export default pdfmake
}
