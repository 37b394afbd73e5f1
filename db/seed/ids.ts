/** Fixed ids make the demo seed idempotent: a second run inserts nothing new. */
export const demoId = (kind: string, key: string) => `demo-${kind}-${key}`;
