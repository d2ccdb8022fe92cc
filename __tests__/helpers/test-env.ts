// Runs before each test file's modules load: one database per jest worker. TEST_DB_PREFIX
// keeps two test runs on one machine (say, two terminals) out of each other's way.
process.env.NODE_ENV = 'test';
process.env.DB_NAME = `${process.env.TEST_DB_PREFIX ?? 'specbench_t'}_${process.env.JEST_WORKER_ID ?? '1'}`;
