"use client";
// The draft editor: every limit of a profile in one keyboard-usable form, validated on the client with
// the same schema the server uses (lib/profiles/limits-schema.ts), saved through a server action that
// validates again and marks any field it refuses. Unsaved edits can be previewed before saving.
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { FormProvider, useFieldArray, useForm, useFormContext, type Resolver } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/states";
import { DraftLimitsSchema, type DraftLimits } from "@/lib/profiles/limits-schema";
import { saveDraftAction } from "@/app/(console)/console/profiles/actions";
import { errorAt, FoldedSection, LimitField, NumberField, OptionalGroup, Section, TextField } from "./limit-fields";
import { ImpactPreview } from "./impact-preview";

const SOURCE_TBD = "common practice";
const limit = (value: number) => ({ value, source: SOURCE_TBD });

function RemoveButton({ onClick, label }: { onClick: () => void; label: string }) {
  return (
    <Button variant="ghost" size="sm" onClick={onClick} aria-label={label}>
      Remove
    </Button>
  );
}

function AttenuationTable() {
  const { control } = useFormContext<DraftLimits>();
  const { fields, append, remove } = useFieldArray({ control, name: "attenuation" });
  return (
    <Section title="Fibre attenuation" description="Maximum attenuation coefficient per fibre type and wavelength. List fibre types separated by commas, e.g. OS1a, OS2.">
      <div className="overflow-x-auto">
        <table className="min-w-full text-sm">
          <thead className="text-left text-xs text-ink-600">
            <tr><th className="p-1">Fibre types</th><th className="p-1">Wavelength (nm)</th><th className="p-1">Max dB/km</th><th className="p-1">Source</th><th /></tr>
          </thead>
          <tbody>
            {fields.map((f, i) => (
              <tr key={f.id} className="align-top">
                <td className="p-1"><TextField name={`attenuation.${i}.fibreTypes`} label={`Row ${i + 1} fibre types`} hideLabel list /></td>
                <td className="w-32 p-1"><NumberField name={`attenuation.${i}.wavelengthNm`} label={`Row ${i + 1} wavelength`} hideLabel step="1" /></td>
                <td className="w-28 p-1"><NumberField name={`attenuation.${i}.maxDbPerKm`} label={`Row ${i + 1} maximum dB per km`} hideLabel /></td>
                <td className="p-1"><TextField name={`attenuation.${i}.source`} label={`Row ${i + 1} source`} hideLabel /></td>
                <td className="p-1"><RemoveButton onClick={() => remove(i)} label={`Remove attenuation row ${i + 1}`} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <Button variant="secondary" size="sm" onClick={() => append({ fibreTypes: ["OS2"], wavelengthNm: 1310, maxDbPerKm: 0.4, source: SOURCE_TBD })}>Add attenuation row</Button>
    </Section>
  );
}

function ApplicationsTable() {
  const { control } = useFormContext<DraftLimits>();
  const { fields, append, remove } = useFieldArray({ control, name: "applications" });
  return (
    <FoldedSection path="applications" count={fields.length} title="Applications" description="Channel insertion loss and reach per application and wavelength (e.g. IEEE 802.3 tables). The budget used is the tighter of this and the component loss budget.">
      {fields.length === 0 && <p className="text-sm text-ink-600">No application limits in this profile.</p>}
      <div className="space-y-3">
        {fields.map((f, i) => (
          <div key={f.id} className="space-y-2 rounded-md border border-ink-100 bg-white p-3">
            <div className="grid gap-2 sm:grid-cols-[1fr_1fr_8rem_auto]">
              <TextField name={`applications.${i}.application`} label="Application" />
              <TextField name={`applications.${i}.fibreTypes`} label="Fibre types" list />
              <NumberField name={`applications.${i}.wavelengthNm`} label="Wavelength" unit="nm" step="1" />
              <div className="self-end"><RemoveButton onClick={() => remove(i)} label={`Remove application row ${i + 1}`} /></div>
            </div>
            <div className="grid gap-2 lg:grid-cols-2">
              <LimitField name={`applications.${i}.maxChannelLossDb`} label="Max channel loss" unit="dB" />
              <LimitField name={`applications.${i}.maxReachM`} label="Max reach" unit="m" />
            </div>
            <OptionalGroup name={`applications.${i}.minReachM`} label="Minimum reach applies" fallback={limit(0)}>
              <LimitField name={`applications.${i}.minReachM`} label="Min reach" unit="m" />
            </OptionalGroup>
          </div>
        ))}
      </div>
      <Button variant="secondary" size="sm" onClick={() => append({ application: "", fibreTypes: ["OM4"], wavelengthNm: 850, maxChannelLossDb: limit(2.9), maxReachM: limit(400) })}>Add application</Button>
    </FoldedSection>
  );
}

function ReceiverWindows({ index }: { index: number }) {
  const { control } = useFormContext<DraftLimits>();
  const { fields, append, remove } = useFieldArray({ control, name: `ponClasses.${index}.receiverWindows` });
  return (
    <div className="space-y-2">
      <p className="text-xs font-semibold text-ink-800">Receiver windows</p>
      {fields.map((f, j) => (
        <div key={f.id} className="space-y-2 rounded border border-ink-100 p-2">
          <div className="grid gap-2 sm:grid-cols-[8rem_1fr_auto]">
            <NumberField name={`ponClasses.${index}.receiverWindows.${j}.wavelengthNm`} label="Wavelength" unit="nm" step="1" />
            <TextField name={`ponClasses.${index}.receiverWindows.${j}.receiver`} label="Receiver (e.g. ONU, OLT)" />
            <div className="self-end"><RemoveButton onClick={() => remove(j)} label={`Remove receiver window ${j + 1}`} /></div>
          </div>
          <div className="grid gap-2 lg:grid-cols-2">
            <LimitField name={`ponClasses.${index}.receiverWindows.${j}.minDbm`} label="Minimum received power" unit="dBm" />
            <LimitField name={`ponClasses.${index}.receiverWindows.${j}.maxDbm`} label="Maximum received power" unit="dBm" />
          </div>
        </div>
      ))}
      <Button variant="secondary" size="sm" onClick={() => append({ wavelengthNm: 1490, receiver: "ONU", minDbm: limit(-28), maxDbm: limit(-8) })}>Add receiver window</Button>
    </div>
  );
}

function PonClassesTable() {
  const { control } = useFormContext<DraftLimits>();
  const { fields, append, remove } = useFieldArray({ control, name: "ponClasses" });
  return (
    <FoldedSection path="ponClasses" count={fields.length} title="PON classes" description="Optical distribution network classes: minimum and maximum path loss and the receivers' power windows.">
      {fields.length === 0 && <p className="text-sm text-ink-600">No PON classes in this profile.</p>}
      {fields.map((f, i) => (
        <div key={f.id} className="space-y-2 rounded-md border border-ink-100 bg-white p-3">
          <div className="grid gap-2 sm:grid-cols-[8rem_1fr_auto]">
            <TextField name={`ponClasses.${i}.ponClass`} label="Class" />
            <TextField name={`ponClasses.${i}.family`} label="Family (e.g. G-PON)" />
            <div className="self-end"><RemoveButton onClick={() => remove(i)} label={`Remove PON class ${i + 1}`} /></div>
          </div>
          <div className="grid gap-2 lg:grid-cols-2">
            <LimitField name={`ponClasses.${i}.minLossDb`} label="Minimum loss" unit="dB" />
            <LimitField name={`ponClasses.${i}.maxLossDb`} label="Maximum loss" unit="dB" />
          </div>
          <ReceiverWindows index={i} />
        </div>
      ))}
      <Button variant="secondary" size="sm" onClick={() => append({ ponClass: "", family: "", minLossDb: limit(13), maxLossDb: limit(28), receiverWindows: [] })}>Add PON class</Button>
      <TextField name="defaultPonClass" label="Default PON class (when a test names none; leave empty for none)" optional />
    </FoldedSection>
  );
}

function DecisionRule() {
  const { register, formState } = useFormContext<DraftLimits>();
  const error = errorAt(formState.errors, "decisionRule.value");
  return (
    <div className="grid gap-2 sm:grid-cols-[14rem_1fr]">
      <div className="space-y-0.5">
        <label htmlFor="decision-rule" className="block text-xs font-medium text-ink-800">Decision rule</label>
        <select id="decision-rule" className="block w-full rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm" {...register("decisionRule.value")}>
          <option value="simple">Simple acceptance</option>
          <option value="guarded">Guarded acceptance</option>
        </select>
        {error && <p role="alert" className="text-xs text-verdict-fail">{error}</p>}
      </div>
      <TextField name="decisionRule.source" label="Source" />
    </div>
  );
}

export function DraftEditor({ slug, initial, canEdit }: { slug: string; initial: DraftLimits; canEdit: boolean }) {
  const methods = useForm<DraftLimits>({
    resolver: zodResolver(DraftLimitsSchema) as Resolver<DraftLimits>,
    defaultValues: initial,
    mode: "onBlur",
  });
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const { handleSubmit, setError, reset, formState, getValues } = methods;

  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    // Empty optional text fields mean "none".
    if (!values.defaultPonClass) delete values.defaultPonClass;
    const r = await saveDraftAction(slug, values);
    if (r.ok) {
      reset(r.data.limits as DraftLimits);
      setMessage({ tone: "success", text: "Draft saved. Preview its impact or publish it below." });
    } else {
      for (const issue of r.issues) if (issue.path) setError(issue.path as never, { message: issue.message });
      setMessage({ tone: "error", text: r.error });
    }
  }, () => setMessage({ tone: "error", text: "Some values need attention; see the marked fields." }));

  return (
    <FormProvider {...methods}>
      <form onSubmit={onSubmit} noValidate aria-label="Draft limits" className="space-y-4">
        <fieldset disabled={!canEdit || formState.isSubmitting} className="space-y-4">
          <Section title="Decision" description="How a result inside a guard band is called: simple acceptance passes up to the limit and calls the band below it marginal; guarded acceptance calls the band on both sides marginal.">
            <DecisionRule />
          </Section>
          <AttenuationTable />
          <Section title="Component allowances" description="Added to the loss budget per component, and used as per-event limits.">
            <div className="grid gap-2 lg:grid-cols-2">
              <LimitField name="connectorLossDb" label="Connector pair" unit="dB" />
              <LimitField name="spliceLossDb" label="Splice" unit="dB" />
              <LimitField name="splitterExcessLossDbPerStage" label="Splitter excess per 1x2 stage" unit="dB" />
              <LimitField name="designMarginDb" label="Design margin" unit="dB" hint="Added to the budget; negative to demand headroom." />
            </div>
            <OptionalGroup name="endConnectionLossDb" label="Separate allowance for the end connections to reference-grade cords" fallback={{ multimode: limit(0.3), singlemode: limit(0.5) }}>
              <div className="grid gap-2 lg:grid-cols-2">
                <LimitField name="endConnectionLossDb.multimode" label="End connection, multimode" unit="dB" />
                <LimitField name="endConnectionLossDb.singlemode" label="End connection, single-mode" unit="dB" />
              </div>
            </OptionalGroup>
          </Section>
          <Section title="Reflectance" description="Maximum reflectance of an event by fibre family and polish.">
            <div className="grid gap-2 lg:grid-cols-3">
              <LimitField name="reflectanceMaxDb.multimode" label="Multimode" unit="dB" />
              <LimitField name="reflectanceMaxDb.upc" label="Single-mode UPC" unit="dB" />
              <LimitField name="reflectanceMaxDb.apc" label="Single-mode APC" unit="dB" />
            </div>
            <OptionalGroup name="spliceReflectanceMaxDb" label="Splice reflectance limit" fallback={{ multimode: limit(-40), singlemode: limit(-50) }}>
              <div className="grid gap-2 lg:grid-cols-2">
                <LimitField name="spliceReflectanceMaxDb.multimode" label="Splice, multimode" unit="dB" />
                <LimitField name="spliceReflectanceMaxDb.singlemode" label="Splice, single-mode" unit="dB" />
              </div>
            </OptionalGroup>
          </Section>
          <Section title="Optical return loss" description="Minimum ORL, and how far a reported ORL may stray from what the events and the fibre's backscatter imply.">
            <div className="grid gap-2 lg:grid-cols-2">
              <OptionalGroup name="orlMinDb.multimode" label="Minimum ORL for multimode" fallback={limit(20)}>
                <LimitField name="orlMinDb.multimode" label="Minimum ORL, multimode" unit="dB" />
              </OptionalGroup>
              <OptionalGroup name="orlMinDb.singlemode" label="Minimum ORL for single-mode" fallback={limit(27)}>
                <LimitField name="orlMinDb.singlemode" label="Minimum ORL, single-mode" unit="dB" />
              </OptionalGroup>
              <LimitField name="orlConsistency.toleranceDb" label="ORL consistency tolerance" unit="dB" />
              <LimitField name="orlConsistency.backscatterReturnLossDb.multimode" label="Backscatter return loss, multimode" unit="dB" />
              <LimitField name="orlConsistency.backscatterReturnLossDb.singlemode" label="Backscatter return loss, single-mode" unit="dB" />
            </div>
          </Section>
          <Section title="Length, position and macrobends">
            <div className="grid gap-2 lg:grid-cols-2">
              <LimitField name="lengthTolerance.percent" label="Length tolerance" unit="%" />
              <LimitField name="lengthTolerance.minimumM" label="Length tolerance, at least" unit="m" />
              <LimitField name="eventPositionToleranceM" label="Same-event position tolerance" unit="m" />
              <LimitField name="macrobendThresholdDb" label="Macrobend threshold (long minus short wavelength)" unit="dB" />
            </div>
          </Section>
          <Section title="Guard bands" description="Measurement uncertainty by test method; a result within the band of a limit is marginal.">
            <div className="grid gap-2 lg:grid-cols-2">
              <LimitField name="guardBands.one-cord" label="One-cord reference" unit="dB" />
              <LimitField name="guardBands.two-cord" label="Two-cord reference" unit="dB" />
              <LimitField name="guardBands.three-cord" label="Three-cord reference" unit="dB" />
              <LimitField name="guardBands.otdr" label="OTDR" unit="dB" />
              <LimitField name="guardBands.orl" label="ORL" unit="dB" />
              <LimitField name="guardBands.power" label="Received power" unit="dB" />
              <LimitField name="guardBands.lengthPercent" label="Length" unit="%" />
            </div>
          </Section>
          <ApplicationsTable />
          <PonClassesTable />
        </fieldset>
        <div className="sticky bottom-0 z-10 flex flex-wrap items-center gap-3 border-t border-ink-100 bg-white/95 py-3 backdrop-blur">
          {canEdit && <Button type="submit" busy={formState.isSubmitting}>Save draft</Button>}
          {canEdit && formState.isDirty && <span className="text-xs text-verdict-marginal">Unsaved changes</span>}
          {message && (message.tone === "success" ? <Notice tone="success">{message.text}</Notice> : <p role="alert" className="text-sm font-medium text-verdict-fail">{message.text}</p>)}
        </div>
      </form>
      {canEdit && <ImpactPreview slug={slug} currentLimits={() => getValues()} dirty={formState.isDirty} />}
    </FormProvider>
  );
}
