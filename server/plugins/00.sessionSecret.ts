// Fail fast at boot: without a 32+ character NUXT_SESSION_PASSWORD every sign-in would
// fail with 500 after its writes. `npm start` generates and keeps a local one in .data/.
export default defineNitroPlugin(() => {
  const secret = process.env.NUXT_SESSION_PASSWORD || ''
  if (!import.meta.dev && secret.length < 32) {
    throw new Error('NUXT_SESSION_PASSWORD must be set to at least 32 characters (npm start sets a local one)')
  }
})
