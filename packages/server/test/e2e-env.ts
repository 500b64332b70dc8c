// The specs sign in far more often than a person would; rate-limits.e2e-spec.ts checks the limit itself.
process.env.AUTH_RATE_LIMIT_PER_MINUTE ??= '1000';
