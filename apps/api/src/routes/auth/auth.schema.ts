// Request shapes for /api/auth.
export {
  accountTokenCheckRequestSchema,
  passwordResetRequestSchema,
  setPasswordRequestSchema,
  signInRequestSchema,
} from '@heatpath/contracts';
