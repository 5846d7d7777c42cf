import { useMutation } from "@tanstack/react-query";
import type { EvaluateRequest, EvaluateResponse } from "@shared/compliance/schemas";
import { api } from "@/lib/api-client";

/** "Can this travel?": a what-if evaluation; the server stores nothing. */
export function useEvaluate() {
  return useMutation({
    mutationFn: (request: EvaluateRequest) =>
      api<EvaluateResponse>("/api/compliance/evaluate", { method: "POST", body: request }),
  });
}
