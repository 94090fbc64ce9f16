// Rowbench's starting pre-season list, written from common shop practice (no published source).
export interface DefaultChecklistItem { area: string, label: string, hint: string | null }

export const DEFAULT_CHECKLIST_NAME = 'Pre-season planter check'

export const DEFAULT_CHECKLIST: DefaultChecklistItem[] = [
  { area: 'Drive', label: 'Drive chains: wear, stretch and stiff links', hint: 'Lay a length of chain flat and compare it with new; replace a chain that has stretched visibly or kinks.' },
  { area: 'Drive', label: 'Sprockets: hooked or thin teeth, alignment with the chain', hint: 'Sight along the chain run; idlers take up slack without forcing it.' },
  { area: 'Drive', label: 'Drive tire pressure', hint: 'Pressure changes the rolling circumference and so the seed rate; set it to what the circumference was measured at.' },
  { area: 'Drive', label: 'Bearings on drive shafts and wheels', hint: 'Spin by hand with the drive out of gear: no roughness, no wobble.' },
  { area: 'Meters', label: 'Seed plates: worn or chipped cells', hint: null },
  { area: 'Meters', label: 'Hopper bottoms: worn housings, brushes and knockers', hint: null },
  { area: 'Row units', label: 'Opener discs: diameter wear and edge', hint: 'Measure the diameter and compare with the new size; worn discs open a shallower, wider furrow.' },
  { area: 'Row units', label: 'Gauge wheels and depth adjustment move freely and hold', hint: null },
  { area: 'Row units', label: 'Press wheels and scrapers', hint: 'Tread, bearings and scraper clearance.' },
  { area: 'Row units', label: 'Down-pressure springs and their settings match side to side', hint: null },
  { area: 'Frame', label: 'Markers: arms, discs and hydraulic cylinders', hint: 'Look for weeping seals and rubbed hoses.' },
  { area: 'Frame', label: 'Hydraulic hoses, couplers and fold cylinders', hint: 'Relieve pressure before loosening any fitting.' },
  { area: 'Chemicals', label: 'Granular and liquid meters emptied and cleaned out', hint: 'Follow the product label for cleaning and for disposing of what is left.' },
]
