import './shows.css';

/** Asks for the server's access token (THROWLINE_TOKEN); the form posts to /api/session. */
export function SignIn({ failed }: { failed: boolean }) {
  return (
    <main className="shows-page shows-signin">
      <h1>Throwline</h1>
      <p>This Throwline server needs its access token. Ask whoever runs it.</p>
      {failed ? (
        <p className="shows-notice shows-notice--error" role="alert">
          That is not this server&apos;s access token.
        </p>
      ) : null}
      <form method="post" action="/api/session">
        <label htmlFor="token">Access token</label>{' '}
        <input id="token" name="token" type="password" autoComplete="current-password" required />{' '}
        <button type="submit">Sign in</button>
      </form>
    </main>
  );
}
