// Pages other than sign-in and sign-up need a session; the server checks again on every API call.
const publicPages = new Set(['/signin', '/signup', '/password-reset'])
// An invitation link is opened before its holder has an account; the page signs up or in itself.
// A password-reset link is opened by someone who cannot sign in.
const publicPrefixes = ['/invitations/', '/password-reset/']

export default defineNuxtRouteMiddleware((to) => {
  const { loggedIn } = useUserSession()
  if (!loggedIn.value && !publicPages.has(to.path) && !publicPrefixes.some(p => to.path.startsWith(p))) {
    return navigateTo({ path: '/signin', query: to.fullPath !== '/' ? { next: to.fullPath } : {} })
  }
})
