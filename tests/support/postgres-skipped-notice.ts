// Vitest global setup for runs without a PostgreSQL server: says once why the server suites are absent.
export default function setup(): void {
  console.log('PostgreSQL suites skipped: KERFWISE_TEST_DATABASE_URL is not set (.ci/run sets it).');
}
