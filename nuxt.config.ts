// Rowbench: Nuxt 4 with the project root as source dir.
export default defineNuxtConfig({
  compatibilityDate: '2026-11-01',
  srcDir: '.',
  dir: { app: '.' },
  telemetry: false,
  devtools: { enabled: false },
  modules: ['@nuxtjs/tailwindcss', '@pinia/nuxt', 'nuxt-auth-utils', '@nuxt/eslint'],
  css: ['~/assets/css/main.css'],
  typescript: { strict: true },
})
