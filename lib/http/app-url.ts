/** The app's public address, for links in e-mails and the payment provider's return addresses. */
export function appUrl(): string {
  return process.env.APP_URL ?? process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3000";
}
