/** Where to go after signing in: only paths on this site, so a link cannot send someone elsewhere. */
export function safeCallbackUrl(raw: string | string[] | undefined | null, fallback = "/projects"): string {
  const value = Array.isArray(raw) ? raw[0] : raw;
  if (!value) return fallback;
  try {
    // Whatever the host of an absolute URL, keep only its path: we never leave this site.
    const url = new URL(value, "http://this.site");
    const path = `${url.pathname}${url.search}${url.hash}`;
    return path.startsWith("/") && !path.startsWith("//") ? path : fallback;
  } catch {
    return fallback;
  }
}

export function signInPath(callbackUrl: string): string {
  return `/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`;
}

/** next-auth's error codes (in ?error= after a failed redirect) in our words. */
export function signInErrorMessage(code: string | undefined): string | null {
  if (!code) return null;
  switch (code) {
    case "Verification":
      return "that sign-in link has expired or was already used; ask for a new one below";
    case "EmailSignin":
      return "the sign-in link could not be sent; try again in a moment, or sign in with your password";
    case "CredentialsSignin":
      return "e-mail or password is wrong";
    case "SessionRequired":
      return "sign in to see that page";
    default:
      return "signing in did not work; try again";
  }
}
