// Stand-in for the `server-only` marker package under vitest (it throws outside Next's server bundle).
export {}
