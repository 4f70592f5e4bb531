// Password hashing with bcryptjs. Cost 10 is the floor Heatpath accepts.
import bcrypt from 'bcryptjs';

export const bcryptCost = 10;

export const hashPassword = (plain: string): Promise<string> => bcrypt.hash(plain, bcryptCost);

// A real hash to compare against when no account matches, so timing does not reveal whether an
// address exists.
const decoyHash = bcrypt.hashSync('heatpath-decoy-password', bcryptCost);

export async function verifyPassword(plain: string, hash: string | null): Promise<boolean> {
  const ok = await bcrypt.compare(plain, hash ?? decoyHash);
  return ok && hash !== null;
}
