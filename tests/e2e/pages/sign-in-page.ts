import type { Page } from "playwright-core";

export class SignInPage {
  constructor(private readonly page: Page, private readonly baseUrl: string) {}

  async open() {
    await this.page.goto(`${this.baseUrl}/sign-in`);
  }

  async signIn(email: string, password: string) {
    await this.page.getByLabel("E-mail").fill(email);
    await this.page.getByLabel("Password").fill(password);
    await this.page.getByRole("button", { name: "Sign in" }).click();
  }

  /** The refusal notice (the framework's route announcer is an alert too, so match by text). */
  async refusalText() {
    const notice = this.page.getByRole("alert").filter({ hasText: /refused|could not/ });
    await notice.waitFor();
    return notice.textContent();
  }
}

export class AppShell {
  constructor(private readonly page: Page) {}

  signedInAs() {
    return this.page.getByTestId("signed-in-as");
  }

  async signOut() {
    await this.page.getByRole("button", { name: "Sign out" }).click();
  }
}

/** A tablet-sized page signed in as the given user, landed on their home page. */
export async function signedInTabletPage(browser: import("playwright-core").Browser, baseUrl: string, email: string, password: string) {
  const page = await browser.newPage({ viewport: { width: 768, height: 1024 }, acceptDownloads: true });
  const signIn = new SignInPage(page, baseUrl);
  await signIn.open();
  await signIn.signIn(email, password);
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  return page;
}
