"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, type Path, type Resolver, type UseFormProps } from "react-hook-form";
import type { z } from "zod";
import { applyServerErrors } from "./serverErrors";

type Options<S extends z.ZodObject> = Omit<UseFormProps<z.input<S>, unknown, z.output<S>>, "resolver">;

/**
 * A react-hook-form form checked by one of the API's own schemas (so the inline messages are the server's), with
 * a submit wrapper that puts a failed request's field messages under the fields and keeps the rest as `problem`.
 */
export function useApiForm<S extends z.ZodObject>(schema: S, options: Options<S> = {}) {
  // With a generic schema the resolver's overloads fall back to the constraint; the types are the schema's own.
  const resolver = zodResolver(schema) as unknown as Resolver<z.input<S>, unknown, z.output<S>>;
  const form = useForm<z.input<S>, unknown, z.output<S>>({ ...options, resolver });
  const [problem, setProblem] = useState<string | null>(null);
  const fields = Object.keys(schema.shape) as Path<z.input<S>>[];

  const submit = (action: (values: z.output<S>) => Promise<unknown>) =>
    form.handleSubmit(async (values) => {
      setProblem(null);
      try {
        await action(values);
      } catch (error) {
        setProblem(applyServerErrors(error, form.setError, fields));
      }
    });

  return { form, problem, setProblem, submit };
}
