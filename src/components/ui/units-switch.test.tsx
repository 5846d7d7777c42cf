import { beforeEach, describe, expect, it, vi } from "vitest";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MeasureField } from "./measure-field";
import { UnitsSwitch } from "./units-switch";

function Screen({
  tempF,
  lengthMm,
  onTemp = () => {},
}: {
  tempF: number | null;
  lengthMm: number | null;
  onTemp?: (v: number | null) => void;
}) {
  return (
    <>
      <UnitsSwitch />
      <MeasureField kind="temperature" label="Box temperature" value={tempF} onChange={onTemp} />
      <MeasureField kind="length" label="Carapace" value={lengthMm} onChange={() => {}} />
    </>
  );
}

beforeEach(() => localStorage.clear());

describe("UnitsSwitch", () => {
  it("shows °F and inches until asked, then °C and mm, without changing the stored values", async () => {
    // NIST SP 811 [published]: 95 °F = 35 °C; 101.6 mm = 4 in (the 21 CFR 1240.62 line).
    render(<Screen tempF={95} lengthMm={101.6} />);
    expect(screen.getByLabelText("Box temperature (°F)")).toHaveValue("95");
    expect(screen.getByLabelText("Carapace (in)")).toHaveValue("4");

    await userEvent.click(screen.getByRole("button", { name: "Degrees Celsius and millimetres" }));
    expect(screen.getByLabelText("Box temperature (°C)")).toHaveValue("35");
    expect(screen.getByLabelText("Carapace (mm)")).toHaveValue("101.6");
    expect(screen.getByRole("button", { name: "Degrees Celsius and millimetres" })).toHaveAttribute(
      "aria-pressed",
      "true",
    );
    expect(localStorage.getItem("hatchway.units")).toBe("metric");
  });

  it("remembers the choice from localStorage, and ignores a value it does not know", () => {
    // Web Storage (WHATWG) [published]: localStorage outlives the page.
    localStorage.setItem("hatchway.units", "metric");
    const { unmount } = render(<Screen tempF={32} lengthMm={null} />);
    expect(screen.getByLabelText("Box temperature (°C)")).toHaveValue("0");
    unmount();

    localStorage.setItem("hatchway.units", "kelvin");
    render(<Screen tempF={32} lengthMm={null} />);
    expect(screen.getByLabelText("Box temperature (°F)")).toHaveValue("32");
  });

  it("stores what is typed in °C as °F", async () => {
    // NIST SP 811 [published]: 20 °C = 68 °F.
    localStorage.setItem("hatchway.units", "metric");
    const onTemp = vi.fn();
    render(<Screen tempF={null} lengthMm={null} onTemp={onTemp} />);
    await userEvent.type(screen.getByLabelText("Box temperature (°C)"), "20");
    expect(onTemp).toHaveBeenLastCalledWith(68);
    await userEvent.clear(screen.getByLabelText("Box temperature (°C)"));
    expect(onTemp).toHaveBeenLastCalledWith(null);
  });
});
