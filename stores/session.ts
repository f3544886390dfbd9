// Who is signed in. The sealed cookie is read through nuxt-auth-utils' session endpoint.
export interface SessionUser {
  id: number
  email: string
  displayName: string
  siteRole: 'admin' | 'member'
}

export const useSessionStore = defineStore('session', () => {
  const session = useUserSession()
  const user = computed(() => (session.user.value as SessionUser | null) ?? null)

  async function refresh() {
    await session.fetch()
  }
  async function signIn(body: { email: string; password: string }) {
    await $fetch('/api/auth/signin', { method: 'POST', body })
    await session.fetch()
  }
  /** Sign up: with an invitation the account is made and signed in at once; without, a link is mailed (the answer's message says so). */
  async function signUp(body: { email: string; password: string; displayName: string; invitation?: string }): Promise<{ signedIn: boolean; message: string }> {
    const res = await $fetch<{ user?: SessionUser; message?: string }>('/api/auth/signup', { method: 'POST', body })
    await session.fetch()
    return { signedIn: !!res.user, message: res.message ?? '' }
  }
  /** Open the e-mailed sign-up link: the account is made and this browser signs in. */
  async function confirmSignUp(token: string) {
    await $fetch('/api/auth/signup-confirm', { method: 'POST', body: { token } })
    await session.fetch()
  }
  async function signOut() {
    await $fetch('/api/auth/signout', { method: 'POST' })
    await session.fetch()
  }
  return { user, refresh, signIn, signUp, confirmSignUp, signOut }
})
