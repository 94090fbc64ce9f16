export * from './accounts'
export * from './equipment'
export * from './setups'
export * from './fields'
