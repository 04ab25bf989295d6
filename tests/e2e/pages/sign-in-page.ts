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
