// Runs before each test file's modules load: one database per jest worker.
process.env.NODE_ENV = 'test';
process.env.DB_NAME = `specbench_t_${process.env.JEST_WORKER_ID ?? '1'}`;
