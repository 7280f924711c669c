import bcrypt from 'bcryptjs';

// bcrypt cost 11: about a tenth of a second on this class of machine, the usual trade between
// slowing a guesser and keeping sign-in quick.
const COST = 11;

export const hashPassword = (password: string) => bcrypt.hash(password, COST);

/** Compares in constant time; a missing hash still costs one comparison so timing does not tell who exists. */
export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
	const ok = await bcrypt.compare(password, hash ?? DUMMY_HASH);
	return ok && !!hash;
}

const DUMMY_HASH = bcrypt.hashSync('no account has this password', COST);
