// Our own sentence for every answer of better-auth a page can meet. Its raw messages
// ("Failed to create user") never reach a person.

/** Error codes our before-hook answers with; their messages are already ours. */
export const OWN_CODES = { throttled: "TOO_MANY_ATTEMPTS", invalid: "INVALID_INPUT" } as const;

export const TOO_MANY_REQUESTS = "Too many attempts from your network. Wait a minute, then try again.";
export const SOMETHING_WRONG = "That did not work, and it is not something you typed. Try again in a moment.";

const byCode: Record<string, string> = {
  INVALID_EMAIL_OR_PASSWORD: "That e-mail and password do not match an account.",
  EMAIL_NOT_VERIFIED: "Confirm your e-mail address first: we have sent you a new link.",
  INVALID_EMAIL: "Enter a valid e-mail address.",
  INVALID_PASSWORD: "Your current password is not right.",
  PASSWORD_TOO_SHORT: "Use at least 10 characters.",
  PASSWORD_TOO_LONG: "Use at most 128 characters.",
  INVALID_TOKEN: "This reset link has expired or was already used. Ask for a new one.",
  TOKEN_EXPIRED: "This link has expired. Ask for a new one.",
  USER_NOT_FOUND: "This link belongs to no account. Ask for a new one.",
  CREDENTIAL_ACCOUNT_NOT_FOUND: "This account has no password to change.",
  FAILED_TO_CREATE_USER: "The account could not be created. Check the name and address, then try again.",
  FAILED_TO_CREATE_SESSION: SOMETHING_WRONG,
  USER_ALREADY_EXISTS: "The account could not be created. Check the name and address, then try again.",
  USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL: "The account could not be created. Check the name and address, then try again.",
  UNAUTHORIZED: "Your session has ended. Sign in again.",
  SESSION_EXPIRED: "Your session has ended. Sign in again.",
  EMAIL_MISMATCH: "Sign out first to confirm another address.",
  EMAIL_ALREADY_VERIFIED: "This address is already confirmed. Sign in.",
  INVALID_ORIGIN: "The request came from another site and was refused.",
  MISSING_OR_NULL_ORIGIN: "The request came from another site and was refused.",
  INVALID_CALLBACK_URL: "The request came from another site and was refused.",
  INVALID_REDIRECT_URL: "The request came from another site and was refused.",
  VALIDATION_ERROR: "Some of the fields are not valid. Check them and try again.",
  FIELD_NOT_ALLOWED: "Some of the fields are not valid. Check them and try again.",
};

export type AuthAnswer = { status: number; code?: string; message?: string; retryAfter?: number };

/** What to tell the person about a refused better-auth call. */
export function authMessage(answer: AuthAnswer, fallback = SOMETHING_WRONG): string {
  if (answer.code && (Object.values(OWN_CODES) as string[]).includes(answer.code) && answer.message) return answer.message;
  if (answer.status === 429) return TOO_MANY_REQUESTS;
  return (answer.code && byCode[answer.code]) || fallback;
}
