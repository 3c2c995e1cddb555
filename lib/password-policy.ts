// Password length policy, shared by the schemas (also imported by client
// forms for hints). NIST SP 800-63B (rev. 3) §5.1.1.2 asks for
// at least 8 characters and allowing at least 64; we ask for 12 and allow
// 256 (the upper bound keeps hashing cost bounded). Citation from memory.
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 256;
