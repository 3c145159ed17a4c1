import "server-only";
import { appUrl } from "./mailer";

/** Where an e-mailed invitation leads. */
export const invitationUrl = (token: string) => `${appUrl()}/invitations/${encodeURIComponent(token)}`;

/** A read-only share link's address. */
export const shareUrl = (token: string) => `${appUrl()}/share/${encodeURIComponent(token)}`;
