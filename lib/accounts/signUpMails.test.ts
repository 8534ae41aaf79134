import { describe, expect, it } from "vitest";
import { signUpAnswer } from "./api";
import { SIGN_UP_TTL_HOURS, signUpAttemptMail, signUpConfirmMail } from "./signUpMails";

const LINK = "https://hubface.example/sign-up/confirm?token=" + "A".repeat(43);

describe("sign-up mails", () => {
  it("the confirmation carries the link in text and HTML, with its life, and escapes the name in HTML", () => {
    const mail = signUpConfirmMail({ to: "ada@example.test", name: `Ada <b>"Bold"</b>`, link: LINK });
    expect(mail.to).toBe("ada@example.test");
    expect(mail.text).toContain(LINK);
    expect(mail.html).toContain(`href="${LINK}"`);
    expect(mail.text).toContain(`expires in ${SIGN_UP_TTL_HOURS} hours`);
    expect(mail.html).toContain("Ada &#60;b&#62;&#34;Bold&#34;&#60;/b&#62;");
    expect(mail.html).not.toContain("<b>");
  });

  it("the notice to an address with an account links to sign-in and reset, and carries no confirmation link", () => {
    const mail = signUpAttemptMail({
      to: "ada@example.test",
      name: "Ada",
      signInLink: "https://hubface.example/sign-in",
      resetLink: "https://hubface.example/forgot-password",
    });
    expect(mail.subject).toBe("Someone tried to sign up with your address");
    for (const part of [mail.text, mail.html]) {
      expect(part).toContain("https://hubface.example/sign-in");
      expect(part).toContain("https://hubface.example/forgot-password");
      expect(part).not.toContain("/sign-up/confirm");
    }
    expect(mail.text).toContain("Nothing was changed on your account.");
  });
});

describe("the sign-up answer", () => {
  it("names the address typed (trimmed) and differs between addresses in nothing else", () => {
    const a = signUpAnswer(" ada@example.test ");
    const b = signUpAnswer("BOB@example.test");
    expect(a.email).toBe("ada@example.test");
    expect(a.title).toBe("Check your e-mail to finish signing up");
    expect(a.message).toContain("ada@example.test");
    expect(JSON.stringify(a).replaceAll("ada@example.test", "@")).toBe(JSON.stringify(b).replaceAll("BOB@example.test", "@"));
  });
});
