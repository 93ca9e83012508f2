import bcrypt from "bcryptjs";

const COST = 10;

export const hashPassword = (plain: string): Promise<string> => bcrypt.hash(plain, COST);

export const verifyPassword = (plain: string, hash: string): Promise<boolean> => bcrypt.compare(plain, hash);

// Compared against when the e-mail is unknown, so a miss costs as long as a wrong password.
export const DUMMY_HASH = "$2b$10$duLTKk34Ge3aYCyIlGF3F.3PAed4A1xLmj.uBthTf9Z5BqUdm.X4G";
