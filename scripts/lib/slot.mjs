// Parallel checkouts on one machine pick a slot (ROWBENCH_SLOT=1…9) so their test servers,
// ports and databases do not collide; CI and a single checkout use slot 0.
export const SLOT = Number(process.env.ROWBENCH_SLOT || 0)
export const suffix = SLOT ? `_${SLOT}` : ''
export const apiPort = 3097 + SLOT * 10
export const apiSmtpPort = 2597 + SLOT * 10
export const e2ePort = 3096 + SLOT * 10
export const e2eSmtpPort = 2596 + SLOT * 10
