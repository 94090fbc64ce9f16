import type { driveSections, driveStages, planters, rowUnits, seedPlates, sprockets } from '../../server/db/schema/equipment'

export type Planter = typeof planters.$inferSelect
export type DriveStage = typeof driveStages.$inferSelect
export type DriveSection = typeof driveSections.$inferSelect & { stages: DriveStage[] }
export type RowUnit = typeof rowUnits.$inferSelect
export type SeedPlate = typeof seedPlates.$inferSelect
export type Sprocket = typeof sprockets.$inferSelect
export type PlanterDetail = Planter & { sections: DriveSection[], rowUnits: RowUnit[] }
