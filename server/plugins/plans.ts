import { onSetupRevision } from '../services/setups'
import { setupRevised } from '../services/plans'

// A new setup revision sends the approved plans that rely on it back to review, in the same transaction.
export default defineNitroPlugin(() => {
  onSetupRevision(setupRevised)
})
