/** Finds a shaft's as-built record by its serial (a plain GET form: works without scripts). */
export function SerialSearch() {
  return (
    <form action="/floor/shafts" method="get" role="search" className="flex gap-2">
      <label htmlFor="serial-search" className="sr-only">
        Serial
      </label>
      <input
        id="serial-search"
        name="serial"
        className="field-input min-h-12 min-w-0 font-mono uppercase placeholder:font-sans placeholder:normal-case"
        placeholder="Shaft serial"
        autoComplete="off"
        required
      />
      <button type="submit" className="btn-quiet min-h-12">
        Find
      </button>
    </form>
  );
}
