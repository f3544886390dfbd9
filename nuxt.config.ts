// Nuxt configuration: the app sits at the repository root (no app/ folder).
export default defineNuxtConfig({
  compatibilityDate: '2026-11-01',
  srcDir: '.',
  dir: { app: '.' },
  modules: ['@pinia/nuxt', '@nuxtjs/tailwindcss', '@vueuse/nuxt', 'nuxt-auth-utils'],
  css: ['@fontsource/source-serif-4/400.css', '@fontsource/source-serif-4/600.css', 'katex/dist/katex.min.css', '~/assets/main.css'],
  app: { head: { link: [{ rel: 'icon', type: 'image/svg+xml', href: '/favicon.svg' }] } },
  devtools: { enabled: false },
  telemetry: false,
  nitro: {
    moduleSideEffects: ['nerdamer/'],
    // The engine uses bigint literals (exact arithmetic); Node 20 runs ES2022.
    esbuild: { options: { target: 'es2022' } },
  },
  vite: {
    optimizeDeps: { include: ['katex', 'vuedraggable', 'nerdamer'] },
    build: { target: 'es2022' },
  },
  typescript: { strict: true },
  runtimeConfig: {
    // Sessions end 30 days after sign-in; only the cookie carries them (no header variant),
    // which is what server/utils/auth/sessions.ts keys its unseal cache on.
    // The password comes from NUXT_SESSION_PASSWORD at run time.
    session: { password: '', maxAge: 30 * 24 * 3600, sessionHeader: false },
  },
})
