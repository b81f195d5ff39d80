// `npm run owner:create -- EMAIL [NAME]` — invites the shop's first owner and prints a one-time link
// to choose the password (the account is made when it is used). Needs the app's DATABASE_URL and APP_URL; refuses when an owner exists.
import "reflect-metadata";
import { getOrm } from "@/lib/db/orm";
import { createFirstOwner } from "@/lib/auth/first-owner";

async function main() {
  const [email, ...name] = process.argv.slice(2);
  if (!email) {
    console.error("Usage: npm run owner:create -- EMAIL [NAME]");
    return 2;
  }
  try {
    const { link, expiresAt } = await createFirstOwner(email, name.join(" "));
    console.log(
      `Owner ${email.toLowerCase()} invited. Open this link to choose the password and sign in (once, until ${expiresAt.toISOString()}):`,
    );
    console.log(link);
    return 0;
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    return 1;
  } finally {
    await (await getOrm()).close();
  }
}

main().then(
  (code) => process.exit(code),
  (error) => {
    console.error(error);
    process.exit(1);
  },
);
