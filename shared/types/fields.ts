import type { fields, seedLots } from '../../server/db/schema/fields'
import type { BoundaryGeometry } from '../utils/boundary'

// Dates arrive as ISO strings over JSON.
type Wire<T> = { [K in keyof T]: T[K] extends Date ? string : T[K] extends Date | null ? string | null : T[K] }

export type Field = Wire<Omit<typeof fields.$inferSelect, 'boundary'>> & { boundary: BoundaryGeometry | null }
export type FieldListItem = Omit<Field, 'boundary'> & { hasBoundary: boolean, outlinePath: string }
export type FieldDetail = Field & { outlinePath: string, measuredAcres?: number }
export interface FieldList { items: FieldListItem[], total: number, totalAcres: number, page: number, limit: number }
export type SeedLot = Wire<typeof seedLots.$inferSelect> & { seedsPerUnit: number, unitWeightLb: number }
export interface FieldImportReport { mode: string, dataRows: number, valid: number, imported: number, errors: { line: number, message: string }[], items: { id: number, name: string, line: number }[] }
