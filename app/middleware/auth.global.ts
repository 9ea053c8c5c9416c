// Pages other than sign-in and sign-up need a session; the server checks again on every API call.
const publicPages = new Set(['/signin', '/signup'])

export default defineNuxtRouteMiddleware((to) => {
  const { loggedIn } = useUserSession()
  if (!loggedIn.value && !publicPages.has(to.path)) {
    return navigateTo({ path: '/signin', query: to.fullPath !== '/' ? { next: to.fullPath } : {} })
  }
})
