// Request shapes for /api/auth.
export { signInRequestSchema } from '@heatpath/contracts';
