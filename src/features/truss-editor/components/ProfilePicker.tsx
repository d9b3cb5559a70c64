import clsx from 'clsx';
import { memo } from 'react';
import { generateProfile, PROFILE_KINDS } from '../../../../shared/engine/profiles';
import type { ProfileKind } from '../../../../shared/engine/profiles/types';
import { focusRing } from '../../../components/ui';
import { drawingFromProfile, type DrawingModel } from '../../../components/truss/model';
import { TrussThumbnail } from '../../../components/truss/TrussThumbnail';

// A typical truss of each kind for the cards (common practice, DESIGN.md §1): 28 ft at 6/12,
// 12 in overhangs; a 3/12 ceiling for the scissor; a 24 in deep, 8-panel flat truss.
const FT = 304.8;
let thumbnails: Map<ProfileKind, DrawingModel> | null = null;
const thumbnailOf = (kind: ProfileKind): DrawingModel | null => {
  thumbnails ??= new Map(
    PROFILE_KINDS.flatMap(({ kind: k }) => {
      try {
        const profile = generateProfile({
          kind: k,
          span: 28 * FT,
          pitch: 6,
          heelHeight: 0,
          overhangLeft: k === 'flat' ? 0 : FT,
          overhangRight: k === 'flat' || k === 'mono' ? 0 : FT,
          bottomPitch: 3,
          depth: 2 * FT,
          panels: 8,
        });
        return [[k, drawingFromProfile(profile)] as const];
      } catch {
        return [];
      }
    }),
  );
  return thumbnails.get(kind) ?? null;
};

/** The nine truss families as cards with a small drawing each; the chosen one is pressed. */
export const ProfilePicker = memo(function ProfilePicker(props: {
  value: ProfileKind;
  onChange: (kind: ProfileKind) => void;
  disabled?: boolean;
}) {
  const { value, onChange, disabled } = props;
  return (
    <div
      role="group"
      aria-label="Truss type"
      className="grid grid-cols-3 gap-2 sm:grid-cols-5 xl:grid-cols-9"
    >
      {PROFILE_KINDS.map((info) => {
        const model = thumbnailOf(info.kind);
        const selected = info.kind === value;
        return (
          <button
            key={info.kind}
            type="button"
            aria-label={info.label}
            aria-pressed={selected}
            title={info.description}
            disabled={disabled && !selected}
            onClick={() => onChange(info.kind)}
            className={clsx(
              'flex flex-col items-center gap-1 rounded-md border bg-white px-2 pt-2 pb-1.5 text-xs transition-colors',
              'disabled:cursor-not-allowed disabled:opacity-50',
              selected
                ? 'border-timber-600 bg-timber-50 text-timber-800 ring-1 ring-timber-600'
                : 'border-sand-200 text-sand-700 hover:border-timber-300 hover:bg-sand-50',
              focusRing,
            )}
          >
            {model ? <TrussThumbnail model={model} /> : null}
            <span className="font-medium">{info.label}</span>
          </button>
        );
      })}
    </div>
  );
});
