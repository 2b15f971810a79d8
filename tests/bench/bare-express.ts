import express from 'express';

/** The yardstick for the API figures: the smallest Express app there is, on the same machine, in the same run. */
const app = express();
app.get('/bare', (_req, res) => {
  res.json({ ok: true });
});
const server = app.listen(Number(process.env.PORT), () => console.log('ready'));
process.on('SIGTERM', () => server.close(() => process.exit(0)));
