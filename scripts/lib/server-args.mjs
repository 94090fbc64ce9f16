// Node flags for the production server. A larger young generation (32 MB semi-spaces, V8's default
// is 16 MB on 64-bit) lets the many short-lived objects of a request die without a scavenge each
// time: about 15-25 % more signed-in calculator requests per second in scripts/bench/http.mjs.
export const SERVER_NODE_ARGS = ['--max-semi-space-size=32']
