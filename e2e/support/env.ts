/** Ports of the app and the fake mail service under test; unusual defaults so a developer's own server can keep running. */
const port = Number(process.env.E2E_PORT ?? 4317);
export const E2E = {
  port,
  baseUrl: `http://localhost:${port}`,
  smtpPort: Number(process.env.E2E_SMTP_PORT ?? 4325),
  mailWebPort: Number(process.env.E2E_MAIL_WEB_PORT ?? 4380),
};
