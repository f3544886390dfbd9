import { defineApiHandler } from '../../utils/http/apiHandler'
import { PRESETS } from '../../../shared/presets/index'

// Theory files shipped with the app; public, read-only.
export default defineApiHandler(() => ({ presets: PRESETS }))
