import { NotFoundNotice } from "@/components/ui/NotFoundNotice";

export default function ShareLinkNotFound() {
  return (
    <NotFoundNotice what="share link">
      This share link was not found, or it has expired or been revoked. Ask whoever sent it for a new one.
    </NotFoundNotice>
  );
}
