import { z } from 'zod'

// The pages' Content-Security-Policy allows no eval (server/utils/http/pageCsp.ts). zod would
// probe `new Function` for its faster object parser, and the browser reports even a caught
// probe as a policy violation: in the browser zod runs without it.
export default defineNuxtPlugin(() => {
  z.config({ jitless: true })
})
