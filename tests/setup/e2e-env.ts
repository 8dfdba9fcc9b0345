// Ports of the end-to-end run, apart from the demo's so both can run at once. RL_E2E_PORT_BASE
// moves the whole set (app on the base, fakes on base+1..3) so two worktrees can test side by side.
const BASE = Number(process.env.RL_E2E_PORT_BASE ?? "0");
const APP_PORT = BASE ? BASE : 3998;
const OAUTH_PORT = BASE ? BASE + 1 : 4191;
const SMTP_PORT = BASE ? BASE + 2 : 4192;
const PAY_PORT = BASE ? BASE + 3 : 4193;

export const E2E_ENV = {
  PORT: String(APP_PORT),
  HOST: "127.0.0.1",
  APP_URL: `http://127.0.0.1:${APP_PORT}`,
  GITHUB_CLIENT_ID: "ramplight-e2e",
  GITHUB_CLIENT_SECRET: "e2e-secret-0123456789",
  GITHUB_OAUTH_URL: `http://127.0.0.1:${OAUTH_PORT}`,
  GITHUB_API_URL: `http://127.0.0.1:${OAUTH_PORT}`,
  FAKE_OAUTH_PORT: String(OAUTH_PORT),
  FAKE_SMTP_PORT: String(SMTP_PORT),
  FAKE_PAY_PORT: String(PAY_PORT),
  // The payments fake (started with the others) and where it sends its signed webhooks.
  PAYMENTS_SECRET_KEY: "sk_test_ramplight_e2e",
  PAYMENTS_API_URL: `http://127.0.0.1:${PAY_PORT}`,
  PAY_WEBHOOK_URL: `http://127.0.0.1:${APP_PORT}/api/payments/webhook`,
  PAY_WEBHOOK_SECRET: "whsec_ramplight_e2e_only",
  SMTP_URL: `smtp://127.0.0.1:${SMTP_PORT}`,
  FAKE_MAIL_DIR: `/tmp/ramplight-e2e-mail${BASE ? "-" + BASE : ""}`,
  OAUTH_CLIENT_ID: "ramplight-e2e",
  OAUTH_CLIENT_SECRET: "e2e-secret-0123456789",
  OAUTH_REDIRECT_URI: `http://127.0.0.1:${APP_PORT}/auth/github/callback`,
  // Journeys sign in many times in a row; the limiter itself is tested on its own.
  SIGN_IN_LIMIT_PER_IP: "1000",
  SIGN_IN_LIMIT_PER_ACCOUNT: "1000",
  // Short-lived codes so a journey can watch one expire; the other code limits keep their defaults.
  SIGN_IN_CODE_PERIOD_S: "30",
} as const;
