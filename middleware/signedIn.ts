// Pages that need an account send signed-out visitors to sign in, then back.
export default defineNuxtRouteMiddleware((to) => {
  const { loggedIn } = useUserSession()
  if (!loggedIn.value) return navigateTo({ path: '/signin', query: { next: to.fullPath } })
})
