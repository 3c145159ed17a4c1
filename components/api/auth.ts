import { useMutation } from "@tanstack/react-query";
import { apiFetch } from "./client";
import { apiPaths } from "@/contracts/api-paths";

export function useSignUp() {
  return useMutation({
    mutationFn: (input: { email: string; name: string; password: string }) =>
      apiFetch<{ message: string }>(apiPaths.signUp, { method: "POST", json: input }),
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (input: { email: string }) => apiFetch<{ message: string }>(apiPaths.passwordReset, { method: "POST", json: input }),
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (input: { token: string; password: string }) =>
      apiFetch<{ message: string }>(apiPaths.passwordResetConfirm, { method: "POST", json: input }),
  });
}
