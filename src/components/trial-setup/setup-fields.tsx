import { LESSON_LIMITS } from "@contracts/lesson-rules";
import { QUESTION_QUANTITIES, RIG_NAMES } from "@contracts/lesson-questions";
import { LINK_SHAPE_LABELS, LINK_SHAPES, RIG_IDS, type LinkShape, type RigId } from "@sim/catalog";
import { Button } from "@/components/ui/button";
import { ChoiceBar } from "@/components/ui/choice-bar";
import { SelectField, TextField } from "@/components/ui/field";
import { PlusIcon, RemoveIcon } from "@/components/ui/icons";
import { draftForRig, paramFieldsFor, unitsFor, withQuantity, type ParamField, type SetupDraft } from "./setup-form";

const unitLabel = (unit: string) => (unit ? ` (${unit})` : "");

/**
 * The fields of one trial's set-up: rig, chain, parameters and question. Shared by the board's
 * set-up panel and the lesson-plan editor; the caller keeps the draft and the messages.
 */
export function SetupFields({ draft, change, errors }: {
  draft: SetupDraft;
  change: (update: (draft: SetupDraft) => SetupDraft) => void;
  errors: Record<string, string>;
}) {
  const fields = paramFieldsFor(draft.rig);
  const numberField = (field: ParamField) => (
    <TextField
      key={`${draft.rig}-${field.key}`}
      label={`${field.meta.label}${unitLabel(field.meta.unit)}`}
      hint={`${field.meta.min} to ${field.meta.max}${field.meta.unit ? ` ${field.meta.unit}` : ""}; empty for ${field.meta.default}`}
      inputMode={field.meta.integer ? "numeric" : "decimal"}
      value={draft.params[field.key] ?? ""}
      placeholder={String(field.meta.default)}
      error={errors[`params.${field.key}`]}
      onChange={(e) => {
        const text = e.target.value;
        change((d) => ({ ...d, params: { ...d.params, [field.key]: text } }));
      }}
    />
  );
  const q = draft.question;
  const quantities = QUESTION_QUANTITIES[draft.rig];
  return (
    <>
      <SelectField
        label="Rig"
        value={draft.rig}
        error={errors.rig}
        onChange={(e) => {
          const rig = e.target.value as RigId;
          change((d) => draftForRig(rig, d.linkShape));
        }}
      >
        {RIG_IDS.map((id) => (
          <option key={id} value={id}>
            {RIG_NAMES[id]}
          </option>
        ))}
      </SelectField>
      <fieldset className="grid gap-3">
        <legend className="mb-1 font-bold">Chain</legend>
        <SelectField
          label="Link shape"
          value={draft.linkShape}
          error={errors["params.linkShape"]}
          onChange={(e) => {
            const linkShape = e.target.value as LinkShape;
            change((d) => ({ ...d, linkShape }));
          }}
        >
          {LINK_SHAPES.map((s) => (
            <option key={s} value={s}>
              {LINK_SHAPE_LABELS[s]}
            </option>
          ))}
        </SelectField>
        {fields.filter((f) => !f.advanced).map(numberField)}
      </fieldset>
      <details>
        <summary className="min-h-touch cursor-pointer font-bold">More settings</summary>
        <div className="mt-2 grid gap-3">{fields.filter((f) => f.advanced).map(numberField)}</div>
      </details>
      <fieldset className="grid gap-3">
        <legend className="mb-1 font-bold">Question</legend>
        <TextField
          label="What pupils are asked"
          value={q.prompt}
          maxLength={LESSON_LIMITS.prompt}
          error={errors["question.prompt"]}
          onChange={(e) => {
            const prompt = e.target.value;
            change((d) => ({ ...d, question: { ...d.question, prompt } }));
          }}
        />
        <SelectField label="What it asks about" value={q.quantity} error={errors["question.quantity"]} onChange={(e) => change((d) => withQuantity(d, e.target.value))}>
          {quantities.map((x) => (
            <option key={x.key} value={x.key}>
              {x.label}
            </option>
          ))}
        </SelectField>
        <ChoiceBar
          legend="How pupils answer"
          visibleLegend="Answer with"
          options={[
            { value: "number", label: "A number" },
            { value: "choice", label: "A choice" },
          ]}
          value={q.kind}
          onChange={(kind) =>
            change((d) => ({
              ...d,
              question: {
                ...d.question,
                kind,
                choices: kind === "choice" && d.question.choices.length === 0 ? [{ label: "", min: "", max: "" }, { label: "", min: "", max: "" }] : d.question.choices,
              },
            }))
          }
        />
        {q.kind === "number" ? (
          <SelectField label="Unit" value={q.unit} error={errors["question.unit"]} onChange={(e) => {
            const unit = e.target.value;
            change((d) => ({ ...d, question: { ...d.question, unit } }));
          }}>
            {unitsFor(draft.rig, q.quantity).map((u) => (
              <option key={u} value={u}>
                {u || "no unit (a ratio)"}
              </option>
            ))}
          </SelectField>
        ) : (
          <div className="grid gap-3">
            {errors["question.choices"] ? <p className="font-bold text-danger">{errors["question.choices"]}</p> : null}
            {q.choices.map((c, i) => {
              const set = (key: "label" | "min" | "max", value: string) =>
                change((d) => ({ ...d, question: { ...d.question, choices: d.question.choices.map((x, j) => (j === i ? { ...x, [key]: value } : x)) } }));
              return (
                <fieldset key={i} className="grid gap-2 rounded-control border border-line p-3 sm:grid-cols-[2fr_1fr_1fr_auto] sm:items-end">
                  <legend className="sr-only">Choice {i + 1}</legend>
                  <TextField label={`Choice ${i + 1}`} value={c.label} maxLength={LESSON_LIMITS.choiceLabel} error={errors[`question.choices.${i}.label`]} onChange={(e) => set("label", e.target.value)} />
                  <TextField label={`From${unitLabel(q.unit)}`} inputMode="decimal" value={c.min} error={errors[`question.choices.${i}.min`]} onChange={(e) => set("min", e.target.value)} />
                  <TextField label={`To${unitLabel(q.unit)}`} inputMode="decimal" value={c.max} error={errors[`question.choices.${i}.max`]} onChange={(e) => set("max", e.target.value)} />
                  <Button
                    variant="quiet"
                    icon={<RemoveIcon />}
                    disabled={q.choices.length <= LESSON_LIMITS.minChoices}
                    onClick={() => change((d) => ({ ...d, question: { ...d.question, choices: d.question.choices.filter((_, j) => j !== i) } }))}
                  >
                    Remove
                  </Button>
                </fieldset>
              );
            })}
            {q.choices.length < LESSON_LIMITS.maxChoices ? (
              <Button icon={<PlusIcon />} onClick={() => change((d) => ({ ...d, question: { ...d.question, choices: [...d.question.choices, { label: "", min: "", max: "" }] } }))}>
                Add a choice
              </Button>
            ) : null}
          </div>
        )}
        <QuestionSwitch label="Ask pupils for a reason too" checked={q.askReason} onChange={(askReason) => change((d) => ({ ...d, question: { ...d.question, askReason } }))} />
        <QuestionSwitch
          label="Ask pupils to explain what they saw after the run"
          checked={q.askExplanation}
          onChange={(askExplanation) => change((d) => ({ ...d, question: { ...d.question, askExplanation } }))}
        />
        <QuestionSwitch label="Offer a re-vote after the discussion" checked={q.revote} onChange={(revote) => change((d) => ({ ...d, question: { ...d.question, revote } }))} />
      </fieldset>
    </>
  );
}

/** One of the question's on/off choices, as a labelled checkbox. */
function QuestionSwitch({ label, checked, onChange }: { label: string; checked: boolean; onChange: (checked: boolean) => void }) {
  return (
    <label className="flex min-h-touch items-center gap-2">
      <input type="checkbox" className="size-5" checked={checked} onChange={(e) => onChange(e.target.checked)} />
      {label}
    </label>
  );
}
