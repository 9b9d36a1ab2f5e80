/** Knex loads migration and seed files itself, outside Vite's transform: let tsx load them. */
export async function withTsx<T>(fn: () => Promise<T>): Promise<T> {
  const { register } = await import('tsx/esm/api');
  const unregister = register();
  try {
    return await fn();
  } finally {
    await unregister();
  }
}
