// The environment the app code reads in tests: only loopback fakes, never a hosted service.
export const TEST_ENV = {
  NODE_ENV: "production",
  APP_URL: "http://127.0.0.1:3999",
  GITHUB_CLIENT_ID: "ramplight-test",
  GITHUB_CLIENT_SECRET: "test-secret-0123456789",
  GITHUB_OAUTH_URL: "http://127.0.0.1:4991",
  GITHUB_API_URL: "http://127.0.0.1:4991",
  // A test that pays starts the payments fake on port 0 and points PAYMENTS_API_URL at it.
  PAYMENTS_SECRET_KEY: "sk_test_ramplight_tests",
  PAYMENTS_API_URL: "http://127.0.0.1:4993",
  PAY_WEBHOOK_SECRET: "whsec_ramplight_tests_only",
} as const;
