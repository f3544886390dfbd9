import { fail } from '../utils/http/apiHandler'

// A NUL character (%00) in an API address, in a route parameter or the query, would reach
// PostgreSQL, which cannot store it: refuse it first, on every route, signed in or not.
export default defineEventHandler((event) => {
  if (!event.path.startsWith('/api/')) return
  if (/%00|\u0000/i.test(event.path)) fail(400, 'The address contains a NUL character (%00); remove it')
})
