/** Archived products stay in old plans and lots; the mark says so in words, with a box-and-lid shape. */
export function ArchivedMark() {
  return (
    <span className="ml-2 inline-flex items-center gap-1 rounded-full border border-walnut-300 bg-paper px-2 py-0.5 text-sm font-semibold text-walnut-800">
      <svg aria-hidden="true" viewBox="0 0 16 16" className="size-4 shrink-0 fill-none stroke-current stroke-[1.6]" strokeLinejoin="round">
        <path d="M2.5 3.5h11v3h-11zM3.5 6.5v6h9v-6M6.5 9h3" />
      </svg>
      Archived
    </span>
  );
}
