"use client";
// Clone a template into a new organisation profile: asks for the slug and name, then opens the draft.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Input } from "@/components/ui/field";
import { ProfileNameSchema, ProfileSlugSchema } from "@/lib/profiles/slug";
import { cloneTemplateAction } from "@/app/(console)/console/profiles/actions";

const CloneSchema = z.object({ slug: ProfileSlugSchema, name: ProfileNameSchema });
type CloneForm = z.infer<typeof CloneSchema>;

export function CloneTemplateButton({ templateSlug, templateName }: { templateSlug: string; templateName: string }) {
  const [open, setOpen] = useState(false);
  const router = useRouter();
  const { register, handleSubmit, setError, formState, reset } = useForm<CloneForm>({
    resolver: zodResolver(CloneSchema),
    defaultValues: { slug: "", name: `${templateName} (ours)` },
  });
  const onSubmit = handleSubmit(async (v) => {
    const r = await cloneTemplateAction({ templateSlug, ...v });
    if (r.ok) {
      setOpen(false);
      reset();
      router.push(`/console/profiles/${r.data.slug}/draft`);
      return;
    }
    const issue = r.issues[0];
    setError(issue?.path === "name" ? "name" : issue?.path === "slug" ? "slug" : "root", { message: issue?.message ?? r.error });
  });
  return (
    <>
      <Button variant="secondary" size="sm" onClick={() => setOpen(true)} aria-label={`Clone ${templateName}`}>Clone</Button>
      <Dialog open={open} onClose={() => setOpen(false)} title={`Clone ${templateName}`}>
        <form onSubmit={onSubmit} noValidate className="space-y-3">
          <p>The new profile starts as a draft with every limit of the template and its sources. Nothing grades under it until you publish.</p>
          <Input label="Slug" hint="Used in API calls as slug or slug@version, e.g. northmere-osp" autoFocus error={formState.errors.slug?.message} {...register("slug")} />
          <Input label="Name" error={formState.errors.name?.message} {...register("name")} />
          {formState.errors.root && <p role="alert" className="text-sm text-verdict-fail">{formState.errors.root.message}</p>}
          <div className="flex justify-end gap-2 pt-2">
            <Button variant="secondary" onClick={() => setOpen(false)}>Cancel</Button>
            <Button type="submit" busy={formState.isSubmitting}>Create draft</Button>
          </div>
        </form>
      </Dialog>
    </>
  );
}
