import { afterEach, describe, expect, it, vi } from "vitest";
import { render, screen, within } from "@testing-library/react";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { DEMO_TAXA } from "@shared/compliance/demo-taxa";
import { evaluateCompliance, type EvaluationInput } from "@shared/compliance/evaluate";
import { buildAnimal, buildFacts, buildInput } from "@shared/compliance/evaluate-fixtures";
import type { TransferComplianceDto } from "@shared/schemas/compliance";
import { ComplianceSection } from "./compliance-section";

const TRANSFER_ID = "00000000-0000-4000-8000-0000000000aa";

/** The server's answer for a leopard tortoise from Tennessee to Ohio with no certificate on file, computed by the real evaluation. */
function complianceDto(
  abilities: Partial<TransferComplianceDto["abilities"]> = {},
  input: Partial<EvaluationInput> = {},
): TransferComplianceDto {
  const facts = buildFacts();
  const result = evaluateCompliance(buildInput({ facts, animals: [buildAnimal(DEMO_TAXA.leopardTortoise)], ...input }));
  return {
    ...result,
    shipDate: facts.shipDate,
    override: null,
    abilities: { override: false, attachDocuments: false, readDocuments: true, ...abilities },
  };
}

function renderSection(dto: TransferComplianceDto) {
  vi.stubGlobal(
    "fetch",
    vi.fn(async (url: string) => {
      const body = url.endsWith("/compliance") ? dto : { documents: [] };
      return new Response(JSON.stringify(body), { status: 200, headers: { "Content-Type": "application/json" } });
    }),
  );
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <ComplianceSection transferId={TRANSFER_ID} />
    </QueryClientProvider>,
  );
}

afterEach(() => vi.unstubAllGlobals());

describe("ComplianceSection", () => {
  it("shows the verdict, each finding with its severity and source, and the legal caution", async () => {
    // [published] 9 CFR 74.1: a leopard tortoise crossing a state line needs a CVI; the rule's text is on ecfr.gov
    renderSection(complianceDto());
    expect(await screen.findByText("Documents needed")).toBeInTheDocument();
    const animal = screen.getByRole("region", { name: "Findings for Stigmochelys pardalis" });
    expect(within(animal).getAllByText("Needs a document").length).toBe(1);
    const source = within(animal).getByRole("link", { name: /9 CFR 74\.1/ });
    expect(source).toHaveAttribute("href", "https://www.ecfr.gov/current/title-9/section-74.1");
    expect(source).toHaveAttribute("rel", "noopener noreferrer");
    // PRODUCT.md: verdicts come with the caution to confirm with the state wildlife agency and a licensed veterinarian
    expect(screen.getByText(/state wildlife agency/)).toHaveTextContent(/licensed veterinarian/);
    expect(screen.queryByRole("button", { name: "Override with this reason" })).not.toBeInTheDocument();
  });

  it("offers the override form only when the server says the caller may override", async () => {
    renderSection(complianceDto({ override: true, readDocuments: false }));
    expect(await screen.findByRole("button", { name: "Override with this reason" })).toBeInTheDocument();
    expect(screen.getByLabelText("Reason")).toBeInTheDocument();
    expect(screen.queryByText("Documents for this transfer")).not.toBeInTheDocument();
  });

  it("says “Unverified” in amber, naming the states not reviewed and the agency to ask, and the shared findings once", async () => {
    // source: issue 12 §1 (product requirement): an unverified verdict names the state and the agency to ask
    const tennesseeOnly = [
      {
        jurisdiction: "TN" as const,
        reviewedOn: "2026-12-01",
        reviewedBy: "Test reviewer",
        wildlifeAgency: { name: "Test Tennessee agency", url: "https://example.test/tn" },
        stateVeterinarian: { name: "Test Tennessee vet", url: "https://example.test/tn-vet" },
      },
    ];
    renderSection(
      complianceDto(
        {},
        {
          facts: buildFacts({ destinationState: "OR" }),
          animals: [buildAnimal(DEMO_TAXA.cornSnake), buildAnimal(DEMO_TAXA.beardedDragon)],
          coverage: tennesseeOnly,
        },
      ),
    );
    const [title] = await screen.findAllByText("Unverified");
    const banner = title?.closest('[role="status"]');
    expect(banner).toHaveClass("border-amber-line");
    // Federal law and Oregon are not reviewed; Tennessee is.
    expect(banner).toHaveTextContent("federal law and Oregon");
    expect(banner).not.toHaveTextContent("Tennessee");
    expect(screen.getAllByText("Rules reviewed Tue, Dec 1, 2026").length).toBe(1);
    // [published] 16 U.S.C. 3372: the Lacey Act applies to every animal moved across a state line: said once
    const shared = screen.getByRole("region", { name: "Findings for every animal" });
    expect(within(shared).getAllByRole("link", { name: /16 U\.S\.C\. 3371/ })).toHaveLength(1);
    const snake = screen.getByRole("region", { name: "Findings for Pantherophis guttatus" });
    expect(within(snake).queryByRole("link", { name: /16 U\.S\.C\. 3371/ })).not.toBeInTheDocument();
  });
});
