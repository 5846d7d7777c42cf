import { describe, expect, it } from "vitest";
import { render, screen } from "@testing-library/react";
import { TextField } from "./field";
import { Notice } from "./feedback";

// WAI-ARIA 1.2: aria-invalid and aria-describedby tie an error message to its control.
describe("TextField", () => {
  it("labels the control and ties the error to it", () => {
    render(<TextField label="ZIP" error="Enter a 5-digit ZIP code" />);
    const input = screen.getByLabelText("ZIP");
    expect(input).toHaveAttribute("aria-invalid", "true");
    const describedBy = input.getAttribute("aria-describedby");
    expect(describedBy).toBeTruthy();
    expect(document.getElementById(describedBy!)).toHaveTextContent("Enter a 5-digit ZIP code");
  });

  it("is not marked invalid without an error", () => {
    render(<TextField label="City" hint="As on the permit" />);
    expect(screen.getByLabelText("City")).not.toHaveAttribute("aria-invalid");
    expect(screen.getByText("As on the permit")).toBeInTheDocument();
  });
});

describe("Notice", () => {
  it("announces a block as an alert", () => {
    render(
      <Notice tone="block" role="alert" title="Not signed in">
        Try again
      </Notice>,
    );
    expect(screen.getByRole("alert")).toHaveTextContent("Not signed in");
  });
});
