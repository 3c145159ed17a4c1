"use client";

/**
 * The "Revoke" action of a row that holds a link (a share link, an invitation): the row's button, and the one
 * confirmation it opens, which runs the revoke mutation, shows its error and closes when it succeeds.
 */
import type { UseMutationResult } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { messageOf } from "@/components/api/client";
import { sentence } from "@/components/format/text";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { buttonStyles } from "@/components/ui/styles";

export interface RevokeTarget {
  id: string;
  /** What the row is called in the button's accessible name and the question ("“for the referee”", "the invitation to …"). */
  name: string;
}

/** State for one revoke confirmation shared by all the rows of a table. */
export function useRevokeConfirmation() {
  const [target, setTarget] = useState<RevokeTarget | null>(null);
  return { target, ask: setTarget, close: () => setTarget(null) };
}

export function RevokeButton({ target, onAsk }: { target: RevokeTarget; onAsk(target: RevokeTarget): void }) {
  return (
    <button type="button" onClick={() => onAsk(target)} className={buttonStyles.row} aria-label={`Revoke ${target.name}`}>
      Revoke
    </button>
  );
}

export function RevokeDialog({
  target,
  onClose,
  revoke,
  confirmLabel,
  children,
}: {
  target: RevokeTarget | null;
  onClose(): void;
  revoke: UseMutationResult<void, Error, string>;
  confirmLabel: string;
  /** What revoking does, in words. */
  children: ReactNode;
}) {
  return (
    <ConfirmDialog
      open={target !== null}
      title={`Revoke ${target?.name ?? ""}?`}
      confirmLabel={confirmLabel}
      pending={revoke.isPending}
      error={revoke.isError ? sentence(messageOf(revoke.error)) : null}
      onCancel={() => {
        onClose();
        revoke.reset();
      }}
      onConfirm={() => target && revoke.mutate(target.id, { onSuccess: onClose })}
    >
      {children}
    </ConfirmDialog>
  );
}
