import { automationOpenApi } from '#shared/automation/openapi'

/** The OpenAPI 3.1 description of the automation API; public, as it holds nothing but the interface. */
export default defineEventHandler(() => automationOpenApi(apiSolveLimit()))
