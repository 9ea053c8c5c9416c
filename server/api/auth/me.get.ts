/** Who is signed in, read fresh from the database. */
export default defineEventHandler(async (event) => {
  const user = await requireCurrentUser(event)
  return toUserDto(user)
})
