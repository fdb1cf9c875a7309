import { useState, type ReactNode } from 'react';
import { ROLE_LABELS, type Role } from '../../../../shared/domain/roles';
import { REEF_LEVELS } from '../../../../shared/domain/season/season-profile';
import type { StoredRobotProfile } from '../../../../shared/schemas/robot-profile';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { ScoringSideOptions } from '../../../components/ui/scoring-side-options';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../hooks/use-form-errors';
import { formatMetres } from '../../../lib/format-number';
import { useSaveRobotProfile } from '../api/robot-profile';
import { formFromProfile, hasChanges, ROBOT_FORM_FIELDS, robotFormSchema, type RobotFormField, type RobotFormValues } from '../model/robot-profile-form';
import { LastChanged } from './last-changed';
import { ScoringDepthReadout } from './scoring-depth-readout';

type RobotProfileFormProps = {
  stored: StoredRobotProfile;
  role: Role;
  canEdit: boolean;
  /** Shown inside the success notice, e.g. a link to where the profile is used. */
  afterSaved?: ReactNode;
};

function Group({ legend, description, children }: { legend: string; description?: string; children: ReactNode }) {
  return (
    <fieldset className="grid gap-4 border-t border-asphalt-750 pt-5 first:border-t-0 first:pt-0 lg:grid-cols-[13rem_minmax(0,1fr)]">
      <div>
        <legend className="float-left font-semibold text-asphalt-100">{legend}</legend>
        {description && <p className="clear-left pt-1 text-sm text-asphalt-400">{description}</p>}
      </div>
      <div className="grid gap-4 sm:grid-cols-2 xl:grid-cols-4">{children}</div>
    </fieldset>
  );
}

export function RobotProfileForm({ stored, role, canEdit, afterSaved }: RobotProfileFormProps) {
  const save = useSaveRobotProfile();
  const { errors, fail, submitWith, formRef } = useFormErrors(ROBOT_FORM_FIELDS);
  const [values, setValues] = useState<RobotFormValues>(() => formFromProfile(stored.profile));
  const [isJustSaved, setIsJustSaved] = useState(false);
  const isDirty = hasChanges(values, stored.profile);

  const set = (field: RobotFormField) => (e: { target: { value: string } }) => {
    setValues((v) => ({ ...v, [field]: e.target.value }));
    setIsJustSaved(false);
  };
  const number = (field: RobotFormField, label: string, unit: string, hint?: ReactNode) => (
    <TextField
      label={label}
      name={field}
      unit={unit}
      inputMode="decimal"
      autoComplete="off"
      isMono
      value={values[field]}
      onChange={set(field)}
      hint={hint}
      error={errors.fields[field]}
    />
  );

  const submit = submitWith(robotFormSchema, (profile) => {
    setIsJustSaved(false);
    save.mutate(profile, {
      onSuccess: (saved) => {
        setValues(formFromProfile(saved.profile));
        setIsJustSaved(true);
      },
      onError: fail,
    });
  });

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-5">
      {!canEdit && (
        <Notice tone="info" title="Read only for your role">
          You’re signed in as {ROLE_LABELS[role].toLowerCase()}. Leads and programmers change the robot profile, because
          scoring targets, the simulator and cycle estimates all follow it.
        </Notice>
      )}
      <fieldset disabled={!canEdit || save.isPending} className="flex flex-col gap-5">
        <Group legend="Frame" description="Sizes of the frame itself, without bumpers.">
          <TextField
            label="Name"
            name="name"
            autoComplete="off"
            value={values.name}
            onChange={set('name')}
            error={errors.fields.name}
          />
          {number('frameLengthM', 'Frame length', 'm', 'Front to back.')}
          {number('frameWidthM', 'Frame width', 'm', 'Side to side.')}
          {number('bumperThicknessM', 'Bumper thickness', 'm', 'Out from the frame, one side.')}
        </Group>

        <Group legend="Scoring" description="Where the robot stands to place coral on a branch.">
          <SelectField
            label="Scoring side"
            name="scoringSide"
            value={values.scoringSide}
            onChange={set('scoringSide')}
            hint="The side of the robot that faces the reef."
            error={errors.fields.scoringSide}
          >
            <ScoringSideOptions />
          </SelectField>
          {number('standoffM', 'Standoff', 'm', 'Gap from bumper to reef face.')}
          <div className="sm:col-span-2">
            <ScoringDepthReadout values={values} savedDepthM={stored.scoringDepthM} />
          </div>
        </Group>

        <Group legend="Drive" description="For the simulator and travel-time estimates.">
          {number('driveMaxSpeedMps', 'Top speed', 'm/s')}
          {number('driveMaxAccelMps2', 'Acceleration', 'm/s²')}
        </Group>

        <Group legend="Elevator" description="Mechanism height at each reef level.">
          {REEF_LEVELS.map((level) => number(`elevatorHeightsM.${level}`, `${level} height`, 'm'))}
        </Group>

        <Group legend="Timing" description="How long the robot takes with a coral in reach.">
          {number('intakeTimeS', 'Intake time', 's', 'Station to coral held.')}
          {number('placeTimeS', 'Place time', 's', 'Aligned to coral released.')}
        </Group>
      </fieldset>

      {errors.form && <Notice tone="error">{errors.form}</Notice>}
      {isJustSaved && !isDirty && (
        <Notice tone="success" title="Robot profile saved">
          Targets now use a reef-to-centre depth of <span className="num">{formatMetres(stored.scoringDepthM)} m</span>. {afterSaved}
        </Notice>
      )}

      <div className="flex flex-wrap items-center gap-3 border-t border-asphalt-750 pt-5">
        {canEdit && (
          <>
            <Button type="submit" variant="primary" isPending={save.isPending}>
              Save robot profile
            </Button>
            <Button
              variant="ghost"
              disabled={!isDirty || save.isPending}
              onClick={() => {
                setValues(formFromProfile(stored.profile));
                setIsJustSaved(false);
              }}
            >
              Discard changes
            </Button>
            {isDirty && <Badge tone="signal">Unsaved changes</Badge>}
          </>
        )}
        <LastChanged stored={stored} className="ml-auto" />
      </div>
    </form>
  );
}
