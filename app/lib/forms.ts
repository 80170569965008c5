import { z } from "zod";

export type FieldErrors = Record<string, string>;

/** A message about the whole form rather than one field. */
export function formError(message: string): FieldErrors {
  return { form: message };
}

export type FormParse<T> =
  | { ok: true; data: T; values: Record<string, string> }
  | { ok: false; fieldErrors: FieldErrors; values: Record<string, string> };

/** Turns a zod error into one message per field (the first), keyed by the field's path. */
export function toFieldErrors(error: z.ZodError): FieldErrors {
  const fieldErrors: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "form";
    fieldErrors[key] ??= issue.message;
  }
  return fieldErrors;
}

function formValues(formData: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of formData.entries()) {
    if (typeof value === "string") values[key] = key in values ? `${values[key]},${value}` : value;
  }
  return values;
}

/** Reads a form body that may be missing or malformed; never throws. */
export async function readFormData(request: Request): Promise<FormData | null> {
  try {
    return await request.clone().formData();
  } catch {
    return null;
  }
}

export async function parseForm<S extends z.ZodType>(request: Request, schema: S): Promise<FormParse<z.infer<S>>> {
  const formData = await readFormData(request);
  if (!formData) {
    return { ok: false, fieldErrors: { form: "The request had no form data. Send the form again." }, values: {} };
  }
  return parseFormData(formData, schema);
}

export function parseFormData<S extends z.ZodType>(formData: FormData, schema: S): FormParse<z.infer<S>> {
  const values = formValues(formData);
  const input: Record<string, string | string[]> = {};
  for (const key of new Set(formData.keys())) {
    const all = formData.getAll(key).filter((v): v is string => typeof v === "string");
    input[key] = all.length > 1 ? all : (all[0] ?? "");
  }
  const result = schema.safeParse(input);
  if (!result.success) return { ok: false, fieldErrors: toFieldErrors(result.error), values };
  return { ok: true, data: result.data, values };
}

/** A form field that arrives once or several times (checkbox groups). */
export function manyOf<T extends z.ZodType>(item: T) {
  return z.preprocess((value) => (value === undefined || value === "" ? [] : Array.isArray(value) ? value : [value]), z.array(item));
}

export const EmailSchema = z
  .string({ error: "Type your e-mail address." })
  .trim()
  .min(1, "Type your e-mail address.")
  .max(254, "That address is too long.")
  .pipe(z.email("That is not an e-mail address: it should look like name@company.com."));
