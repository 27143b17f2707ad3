import { Form } from "react-router";
import { ACQUISITION_LABELS, ACQUISITION_STATUSES } from "~/calculations/acquisition-status";
import { Button } from "~/components/ui/button";
import { Field, SelectField } from "~/components/ui/field";
import { WORK_SORT_LABELS, WORK_SORTS } from "./work-sort";

export interface WorkFilterValues {
  project: string;
  status: string;
  q: string;
  sort: string;
  released: boolean;
}

/** Filter and sort the work list; a plain GET form, so the choice is in the URL and works without scripts. */
export function WorkFilters({ values, projects }: { values: WorkFilterValues; projects: { id: number; name: string }[] }) {
  return (
    <Form method="get" className="grid grid-cols-2 items-end gap-3 md:grid-cols-6" aria-label="Filter and sort">
      <SelectField label="Project" name="project" defaultValue={values.project} options={[{ value: "", label: "All projects" }, ...projects.map((p) => ({ value: String(p.id), label: p.name }))]} />
      <SelectField label="Status" name="status" defaultValue={values.status} options={[{ value: "", label: "Any status" }, ...ACQUISITION_STATUSES.map((s) => ({ value: s, label: ACQUISITION_LABELS[s] }))]} />
      <Field label="Search" name="q" defaultValue={values.q} placeholder="Parcel, owner or address" />
      <SelectField label="Sort by" name="sort" defaultValue={values.sort} options={WORK_SORTS.map((s) => ({ value: s, label: WORK_SORT_LABELS[s] }))} />
      <label className="flex items-center gap-2 pb-2 text-sm">
        <input type="checkbox" name="released" value="1" defaultChecked={values.released} /> Show released parcels
      </label>
      <Button type="submit" variant="secondary">Apply</Button>
    </Form>
  );
}
