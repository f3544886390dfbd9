// Who is signed in. The sealed cookie is read through nuxt-auth-utils' session endpoint.
export interface SessionUser { id: number, email: string, displayName: string, siteRole: 'admin' | 'member' }

export const useSessionStore = defineStore('session', () => {
  const session = useUserSession()
  const user = computed(() => (session.user.value as SessionUser | null) ?? null)

  async function refresh() {
    await session.fetch()
  }
  async function signIn(body: { email: string, password: string }) {
    await $fetch('/api/auth/signin', { method: 'POST', body })
    await session.fetch()
  }
  async function signUp(body: { email: string, password: string, displayName: string, invitation?: string }) {
    await $fetch('/api/auth/signup', { method: 'POST', body })
    await session.fetch()
  }
  async function signOut() {
    await $fetch('/api/auth/signout', { method: 'POST' })
    await session.fetch()
  }
  return { user, refresh, signIn, signUp, signOut }
})
