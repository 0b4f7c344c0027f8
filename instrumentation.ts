/** At server start: open the show database (creating, migrating and seeding it) before any request. */
export async function register() {
  if (process.env.NEXT_RUNTIME === 'nodejs') {
    const { getServerStore } = await import('./lib/storage/serverStore');
    await getServerStore();
  }
}
