import argon2 from 'argon2';

/** argon2id with the library's defaults (memory-hard, slow by design). */
export const hashPassword = (password: string) => argon2.hash(password, { type: argon2.argon2id });
export const verifyPassword = (hash: string, password: string) => argon2.verify(hash, password).catch(() => false);
