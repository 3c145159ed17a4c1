import { NotFoundNotice } from "@/components/ui/NotFoundNotice";

export default function InvitationNotFound() {
  return (
    <NotFoundNotice what="invitation">
      This invitation was not found, or it has expired, been used or been revoked. Ask an owner of the project to send it again.
    </NotFoundNotice>
  );
}
