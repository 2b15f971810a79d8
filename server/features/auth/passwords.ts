import bcrypt from 'bcryptjs';

/** Cost 12: about a quarter of a second per check on these machines, slow enough to blunt guessing. */
const COST = 12;
// Compared against when the e-mail is unknown, so that a miss takes as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', COST);

export const hashPassword = (plain: string) => bcrypt.hash(plain, COST);

export async function checkPassword(plain: string, hash: string | null): Promise<boolean> {
  const ok = await bcrypt.compare(plain, hash ?? DUMMY_HASH);
  return ok && hash !== null;
}
