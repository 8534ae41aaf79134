import { createHash } from "node:crypto";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { hashPassword, verifyPassword } from "@/lib/platform/auth/password";
import { signUpAnswer } from "@/lib/accounts/api";
import { rebuild, testDb } from "./support/db";
import { startTestBoss, stopBoss } from "./support/jobs";
import { ctx, req } from "./support/requests";

/**
 * Security review, issue 12 item 9: sign-up said "an account with this e-mail address already
 * exists", so anyone could find out who has an account. Sign-up now answers the same for every
 * address and the account is made from a link mailed to it.
 */
const db = testDb();
const signup = (await import("@/app/api/account/signup/route")).POST;
const confirm = (await import("@/app/api/account/signup/confirm/route")).POST;
const { signUpQueries } = await import("@/lib/accounts/signUpQueries");

const EXISTING = "holder@example.test";
const PASSWORD = "a long enough password";

beforeAll(async () => {
  await rebuild(db);
  await startTestBoss();
  await db("users").insert({
    email: EXISTING,
    name: "Hal Holder",
    password_hash: await hashPassword("the holder's password"),
    role: "member",
  });
});
beforeEach(async () => {
  // Each test starts with fresh limits and an empty mail queue.
  await db("rate_limits").del();
  await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).del();
});
afterAll(async () => {
  await stopBoss();
  await db.destroy();
  const { db: appDb } = await import("@/lib/platform/db");
  await appDb.destroy();
});

const signUp = (email: string, name = "Nell Quarry", password = PASSWORD) =>
  signup(req("POST", "/api/account/signup", { name, email, password }), ctx());
const confirmWith = (token: string, password = PASSWORD) => confirm(req("POST", "/api/account/signup/confirm", { token, password }), ctx());

/** The mail jobs queued so far, oldest first, as the worker would send them. */
async function queuedMails(): Promise<{ to: string; subject: string; text: string; html: string }[]> {
  const rows = await db.withSchema("pgboss").from("job").where({ name: "mail.send" }).orderBy("created_on").select("data");
  return rows.map((r: { data: { to: string; subject: string; text: string; html: string } }) => r.data);
}
const linkToken = (text: string) => /\/sign-up\/confirm\?token=([A-Za-z0-9_-]{43})\b/.exec(text)?.[1];
const sha256 = (s: string) => createHash("sha256").update(s).digest("hex");
const pendingFor = (email: string) => db("pending_sign_ups").whereRaw("lower(email) = lower(?)", [email]);
const usersWith = (email: string) => db("users").whereRaw("lower(email) = lower(?)", [email]);

/** Signs up a new address and returns the token from its confirmation mail. */
async function pendingSignUp(email: string, name?: string, password?: string): Promise<string> {
  await db("rate_limits").del();
  expect((await signUp(email, name, password)).status).toBe(202);
  const mail = (await queuedMails()).filter((m) => m.to === email).at(-1);
  const token = mail && linkToken(mail.text);
  expect(token).toBeDefined();
  return token!;
}

describe("sign-up answers the same whether or not the address has an account", () => {
  it("same status and body (but for the address typed) for a new and an existing address", async () => {
    const fresh = await signUp("fresh.one@example.test");
    const taken = await signUp(EXISTING.toUpperCase());
    expect([fresh.status, taken.status]).toEqual([202, 202]);
    const a = await fresh.json();
    const b = await taken.json();
    expect(a).toEqual(signUpAnswer("fresh.one@example.test"));
    expect(b).toEqual(signUpAnswer(EXISTING.toUpperCase()));
    expect(JSON.stringify(a).replaceAll("fresh.one@example.test", "@")).toBe(JSON.stringify(b).replaceAll(EXISTING.toUpperCase(), "@"));
    expect(a.title).toBe("Check your e-mail to finish signing up");
    expect(a.message).toContain("fresh.one@example.test");
    expect([...fresh.headers.keys()].filter((k) => k !== "x-request-id")).toEqual(
      [...taken.headers.keys()].filter((k) => k !== "x-request-id"),
    );
  });

  it("a new address: a pending sign-up (no account yet) and a queued mail with the confirmation link", async () => {
    const email = "pending.pat@example.test";
    const res = await signUp(email, "Pat Pending");
    expect(res.status).toBe(202);
    expect(await usersWith(email)).toHaveLength(0);
    const [row] = await pendingFor(email);
    expect(row).toMatchObject({ email, name: "Pat Pending" });
    expect(await verifyPassword(PASSWORD, row.password_hash)).toBe(true);
    // 24 hours from its creation (the link's life, common practice, no source).
    expect(new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()).toBeCloseTo(24 * 3600 * 1000, -4);

    const mails = await queuedMails();
    expect(mails.map((m) => [m.to, m.subject])).toEqual([[email, "Confirm your Hubface account"]]);
    const token = linkToken(mails[0]!.text)!;
    expect(mails[0]!.text).toContain(`http://127.0.0.1:3000/sign-up/confirm?token=${token}`);
    expect(mails[0]!.html).toContain(`/sign-up/confirm?token=${token}`);
    // Only the SHA-256 of the token is stored.
    expect(row.token_hash).toBe(sha256(token));
    expect(JSON.stringify(row)).not.toContain(token);
  });

  it("an existing address: the account is left as it was and its owner gets a mail with sign-in and reset links", async () => {
    const before = await usersWith(EXISTING).first();
    expect((await signUp(EXISTING, "Someone Else", "another long password")).status).toBe(202);
    expect(await usersWith(EXISTING).first()).toEqual(before);
    expect(await pendingFor(EXISTING)).toHaveLength(0);
    const mails = await queuedMails();
    expect(mails.map((m) => [m.to, m.subject])).toEqual([[EXISTING, "Someone tried to sign up with your address"]]);
    expect(mails[0]!.text).toContain("http://127.0.0.1:3000/sign-in");
    expect(mails[0]!.text).toContain("http://127.0.0.1:3000/forgot-password");
    expect(linkToken(mails[0]!.text)).toBeUndefined();
  });

  it("refuses bad input with the form's field messages and writes nothing", async () => {
    const res = await signup(req("POST", "/api/account/signup", { name: " ", email: "not-an-email", password: "short" }), ctx());
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.fieldErrors).toEqual({
      name: ["Enter your name."],
      email: ["Enter an e-mail address like name@example.com."],
      password: ["Use at least 10 characters."],
    });
    expect(await pendingFor("not-an-email")).toHaveLength(0);
    expect(await queuedMails()).toEqual([]);
  });

  it("writes neither the pending sign-up nor its mail when the mail cannot be queued", async () => {
    // The mail job is written by the sign-up's own transaction: refuse it, and nothing stays.
    await db.raw("alter table pgboss.job add constraint test_no_mail check (name <> 'mail.send') not valid");
    try {
      const res = await signUp("half.written@example.test");
      expect(res.status).toBe(500);
    } finally {
      await db.raw("alter table pgboss.job drop constraint test_no_mail");
    }
    expect(await pendingFor("half.written@example.test")).toHaveLength(0);
    expect(await queuedMails()).toEqual([]);
  });
});

describe("confirming a sign-up", () => {
  it("opening the link reads the pending sign-up without using it; the POST creates the account once", async () => {
    const email = "Cora.Linde@example.test";
    const token = await pendingSignUp(email, "Cora Linde");
    // What the page does on GET, twice (a mail scanner, then the person): nothing is used up.
    expect(await signUpQueries.findPendingSignUp(token)).toEqual({ email, name: "Cora Linde" });
    expect(await signUpQueries.findPendingSignUp(token)).toEqual({ email, name: "Cora Linde" });

    const res = await confirmWith(token);
    expect(res.status).toBe(201);
    const body = await res.json();
    const users = await usersWith(email);
    expect(users).toHaveLength(1);
    expect(body).toMatchObject({ id: users[0].id, email, name: "Cora Linde", role: "member" });
    expect(await verifyPassword(PASSWORD, users[0].password_hash)).toBe(true);
    expect(await pendingFor(email)).toHaveLength(0);
    expect(await signUpQueries.findPendingSignUp(token)).toBeUndefined();

    // The link is single-use.
    const again = await confirmWith(token);
    expect(again.status).toBe(422);
    expect((await again.json()).fieldErrors.token[0]).toMatch(/expired, was already used/);
    expect(await usersWith(email)).toHaveLength(1);
  });

  it("of several confirms at once, exactly one creates the account", async () => {
    const email = "race.rhea@example.test";
    const token = await pendingSignUp(email);
    const statuses = (await Promise.all(Array.from({ length: 6 }, () => confirmWith(token)))).map((r) => r.status).sort();
    expect(statuses).toEqual([201, 422, 422, 422, 422, 422]);
    expect(await usersWith(email)).toHaveLength(1);
    expect(await pendingFor(email)).toHaveLength(0);
  });

  it("asks for the password chosen at sign-up; a wrong one changes nothing", async () => {
    const email = "wrong.wes@example.test";
    const token = await pendingSignUp(email);
    const res = await confirmWith(token, "not what was chosen");
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors).toEqual({ password: ["That is not the password you chose when signing up."] });
    expect(await usersWith(email)).toHaveLength(0);
    expect(await pendingFor(email)).toHaveLength(1);
    expect((await confirmWith(token)).status).toBe(201);
  });

  it("refuses an expired, an unknown and a malformed link with a message", async () => {
    const email = "late.lou@example.test";
    const token = await pendingSignUp(email);
    await pendingFor(email).update({ expires_at: db.raw("now() - interval '1 second'") });
    expect(await signUpQueries.findPendingSignUp(token)).toBeUndefined();
    const late = await confirmWith(token);
    expect(late.status).toBe(422);
    expect((await late.json()).fieldErrors.token).toEqual([
      "This sign-up link has expired, was already used or was replaced by a newer one.",
    ]);
    expect(await usersWith(email)).toHaveLength(0);

    const unknown = await confirmWith("A".repeat(43));
    expect(unknown.status).toBe(422);
    expect((await unknown.json()).fieldErrors.token[0]).toMatch(/expired, was already used/);
    const malformed = await confirmWith("short");
    expect(malformed.status).toBe(422);
    expect((await malformed.json()).fieldErrors.token).toEqual(["This sign-up link is not valid. Sign up again."]);
  });

  it("makes no second account when the address got one meanwhile, and says so", async () => {
    const email = "invited.ivy@example.test";
    const token = await pendingSignUp(email);
    // E.g. a shop invitation accepted, or an admin made the account, before the link was used.
    await db("users").insert({
      email: email.toUpperCase(),
      name: "Ivy",
      password_hash: await hashPassword("other password!"),
      role: "member",
    });
    const res = await confirmWith(token);
    expect(res.status).toBe(409);
    expect((await res.json()).error).toMatch(/already has a Hubface account, so no second one was made/);
    expect(await usersWith(email)).toHaveLength(1);
    expect(await pendingFor(email)).toHaveLength(0);
  });
});

describe("signing up again, and the mail limits", () => {
  it("a second sign-up for a pending address replaces it: new token, the old link is dead", async () => {
    const email = "twice.tam@example.test";
    const first = await pendingSignUp(email, "Tam First", "first long password");
    const second = await pendingSignUp(email.toUpperCase(), "Tam Second", "second long password");
    expect(second).not.toBe(first);
    const rows = await pendingFor(email);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ name: "Tam Second", token_hash: sha256(second) });

    expect((await confirmWith(first, "first long password")).status).toBe(422);
    expect((await confirmWith(second, "second long password")).status).toBe(201);
    expect(await usersWith(email).first()).toMatchObject({ name: "Tam Second" });
  });

  it("sends at most one mail per address every 2 minutes and 5 a day, answering the same each time", async () => {
    const email = "flood.fay@example.test";
    const answers = new Set<string>();
    for (let i = 0; i < 4; i++) {
      const res = await signUp(email, `Fay ${i}`);
      expect(res.status).toBe(202);
      answers.add(JSON.stringify(await res.json()));
    }
    expect(answers.size).toBe(1);
    const mails = await queuedMails();
    expect(mails).toHaveLength(1);
    // Over the limit nothing is written either: the first (and only mailed) link still works.
    expect(await pendingFor(email).first()).toMatchObject({ name: "Fay 0" });
    expect(await signUpQueries.findPendingSignUp(linkToken(mails[0]!.text)!)).toMatchObject({ name: "Fay 0" });

    // Two minutes later the next mail goes; after five in a day, none (the rule reset mails follow).
    for (let i = 0; i < 6; i++) {
      await db("rate_limits").where("key", "like", "signup_mail_2min:%").orWhere("key", "like", "signup_addr:%").del();
      await signUp(email);
    }
    expect(await queuedMails()).toHaveLength(5);

    // The same holds for an address with an account: a flood of sign-ups is one notice.
    for (let i = 0; i < 5; i++) await signUp(EXISTING);
    expect((await queuedMails()).filter((m) => m.to === EXISTING)).toHaveLength(1);
  });
});
