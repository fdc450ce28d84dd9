// Shared by the forms (client) and the server; hashing lives in password.ts (server only).
export const PASSWORD_MIN_LENGTH = 8;
export const PASSWORD_MAX_LENGTH = 128;
