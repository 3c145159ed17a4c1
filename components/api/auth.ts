import { useMutation } from "@tanstack/react-query";
import { apiFetch } from "./client";

export function useSignUp() {
  return useMutation({
    mutationFn: (input: { email: string; name: string; password: string }) =>
      apiFetch<{ message: string }>("/api/users", { method: "POST", json: input }),
  });
}

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (input: { email: string }) => apiFetch<{ message: string }>("/api/password-reset", { method: "POST", json: input }),
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (input: { token: string; password: string }) =>
      apiFetch<{ message: string }>("/api/password-reset/confirm", { method: "POST", json: input }),
  });
}
