import { useEffect, useId, useState, type KeyboardEvent } from "react";
import { Controller, type Control, type FieldPath, type FieldValues } from "react-hook-form";
import type { TaxonBriefDto, TaxonSearchHitDto } from "@shared/schemas/transfer";
import type { TaxonSearch } from "@/lib/taxa-search";
import { TaxonName } from "./taxon-name";

type Props = {
  label: string;
  /** The chosen species, or null. */
  value: TaxonBriefDto | null;
  onChange: (taxon: TaxonBriefDto | null) => void;
  /** Where suggestions come from; the screens pass `searchTaxa`, tests their own. */
  search: TaxonSearch;
  onBlur?: () => void;
  error?: string;
  hint?: string;
  /** Letters typed before the first search. */
  minChars?: number;
  debounceMs?: number;
};

/**
 * A species picker in the WAI-ARIA "combobox with list autocomplete" pattern: type a few
 * letters of a scientific, common or old name; Down/Up move through the suggestions, Enter
 * takes one, Escape closes the list (and clears the text when it is already closed).
 */
export function TaxonCombobox({
  label,
  value,
  onChange,
  search,
  onBlur,
  error,
  hint,
  minChars = 2,
  debounceMs = 200,
}: Props) {
  const id = useId();
  const listId = `${id}-list`;
  const [text, setText] = useState(value?.scientificName ?? "");
  const [shownId, setShownId] = useState(value?.id);
  const [query, setQuery] = useState("");
  const [hits, setHits] = useState<TaxonSearchHitDto[]>([]);
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const [status, setStatus] = useState<"idle" | "searching" | "done" | "failed">("idle");

  // A value set from outside (a reset, a duplicated line) shows its name.
  if (value?.id !== shownId) {
    setShownId(value?.id);
    setText(value?.scientificName ?? "");
  }

  useEffect(() => {
    const q = query.trim();
    if (q.length < minChars) {
      setHits([]);
      setStatus("idle");
      return;
    }
    const controller = new AbortController();
    setStatus("searching");
    const timer = setTimeout(() => {
      search(q, controller.signal).then(
        (found) => {
          if (controller.signal.aborted) return;
          setHits(found);
          setActive(-1);
          setStatus("done");
        },
        () => {
          if (!controller.signal.aborted) setStatus("failed");
        },
      );
    }, debounceMs);
    return () => {
      clearTimeout(timer);
      controller.abort();
    };
  }, [query, search, minChars, debounceMs]);

  useEffect(() => {
    if (active >= 0) document.getElementById(`${id}-option-${active}`)?.scrollIntoView?.({ block: "nearest" });
  }, [active, id]);

  const expanded = open && hits.length > 0;
  function optionId(index: number) {
    return `${id}-option-${index}`;
  }

  function choose(hit: TaxonSearchHitDto) {
    setShownId(hit.id);
    setText(hit.scientificName);
    setQuery("");
    setOpen(false);
    setActive(-1);
    onChange(hit);
  }

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    switch (event.key) {
      case "ArrowDown":
        event.preventDefault();
        if (hits.length === 0) return;
        setOpen(true);
        // Alt+Down opens the list without moving into it.
        if (!event.altKey) setActive((i) => (!expanded || i >= hits.length - 1 ? 0 : i + 1));
        return;
      case "ArrowUp":
        event.preventDefault();
        if (hits.length === 0) return;
        setOpen(true);
        setActive((i) => (!expanded || i <= 0 ? hits.length - 1 : i - 1));
        return;
      case "Enter": {
        const hit = expanded && active >= 0 ? hits[active] : undefined;
        if (hit) {
          event.preventDefault();
          choose(hit);
        }
        return;
      }
      case "Escape":
        if (expanded) {
          event.preventDefault();
          setOpen(false);
          setActive(-1);
        } else if (text) {
          event.preventDefault();
          setText("");
          setQuery("");
          setShownId(undefined);
          onChange(null);
        }
        return;
      case "Tab":
        setOpen(false);
        return;
    }
  }

  // Said aloud always; shown on screen only when the list itself cannot say it.
  const message =
    status === "searching"
      ? "Searching…"
      : status === "failed"
        ? "The species search did not answer. Try again."
        : status === "done" && open
          ? hits.length === 0
            ? "No species match. Check the spelling, or try the common name."
            : `${hits.length} species found. Use the up and down arrows to choose.`
          : "";
  const messageVisible = status === "failed" || (status === "done" && open && hits.length === 0);
  const described =
    [error ? `${id}-error` : null, hint && !error ? `${id}-hint` : null].filter(Boolean).join(" ") || undefined;

  return (
    <div className="relative flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      <input
        id={id}
        type="text"
        role="combobox"
        aria-autocomplete="list"
        aria-expanded={expanded}
        aria-controls={listId}
        aria-activedescendant={expanded && active >= 0 ? optionId(active) : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        autoComplete="off"
        spellCheck={false}
        placeholder="Type a scientific or common name"
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setQuery(e.target.value);
          setOpen(true);
          if (value) {
            setShownId(undefined);
            onChange(null);
          }
        }}
        onKeyDown={onKeyDown}
        onBlur={() => {
          setOpen(false);
          onBlur?.();
        }}
        className={`min-h-11 w-full rounded-md border bg-paper-card px-3 py-2 text-base text-ink placeholder:text-ink-faint focus:border-fern focus-visible:outline-hidden focus-visible:ring-3 focus-visible:ring-fern-ring ${error ? "border-brick" : "border-rule"}`}
      />
      <ul
        id={listId}
        role="listbox"
        aria-label={`${label}: suggestions`}
        hidden={!expanded}
        className="absolute left-0 right-0 top-full z-20 mt-1 max-h-72 overflow-y-auto rounded-md border border-rule bg-paper-card shadow-card"
      >
        {hits.map((hit, index) => (
          <li
            key={hit.id}
            id={optionId(index)}
            role="option"
            aria-selected={index === active}
            // mousedown, not click: the input must not blur (and close the list) first.
            onMouseDown={(e) => {
              e.preventDefault();
              choose(hit);
            }}
            onMouseEnter={() => setActive(index)}
            className={`flex min-h-11 cursor-pointer flex-col justify-center px-3 py-1.5 ${index === active ? "bg-fern-light" : ""}`}
          >
            <TaxonName taxon={hit} />
            {hit.matched.kind !== "scientific" && hit.matched.name !== hit.commonName ? (
              <span className="text-xs text-ink-soft">
                {hit.matched.kind === "synonym" ? "Formerly" : "Also called"} {hit.matched.name}
              </span>
            ) : null}
          </li>
        ))}
      </ul>
      <p role="status" aria-live="polite" className={messageVisible ? "text-sm text-ink-soft" : "sr-only"}>
        {message}
      </p>
      {value && !open ? (
        <p className="text-sm">
          <span className="text-ink-soft">Chosen: </span>
          <TaxonName taxon={value} />
        </p>
      ) : null}
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-brick">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** The species of a form line: the combobox bound to a taxon-id field of a react-hook-form form. */
export function TaxonField<T extends FieldValues>({
  control,
  name,
  taxa,
  rememberTaxon,
  search,
}: {
  control: Control<T>;
  name: FieldPath<T>;
  /** Taxa already chosen or loaded, by id, so a chosen id shows its name. */
  taxa: Record<string, TaxonBriefDto>;
  rememberTaxon: (t: TaxonBriefDto) => void;
  search: TaxonSearch;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TaxonCombobox
          label="Species"
          value={taxa[field.value as string] ?? null}
          onChange={(t) => {
            if (t) rememberTaxon(t);
            field.onChange(t?.id ?? "");
          }}
          onBlur={field.onBlur}
          search={search}
          error={fieldState.error ? "Choose the species from the list" : undefined}
        />
      )}
    />
  );
}
