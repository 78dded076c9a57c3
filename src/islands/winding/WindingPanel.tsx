import { withApi } from '~/lib/api/provider';
import { useWindingSessions, type WindingSession } from '~/lib/api/queries/winding';
import type { WindingPlan } from '~/lib/winding';
import { StartForm } from './StartForm';
import { LiveSession } from './LiveSession';
import { FinishedSession, type KeyFigures } from './FinishedSession';

type Props = {
  designId: string;
  canWrite: boolean;
  initial: WindingSession[];
  /** null when the design has no secondary to wind (it no longer parses) */
  plan: WindingPlan | null;
  defaults: { rpm: number; startOffset: number; formLength: number };
  current: KeyFigures;
};

/** The winding page: the session under way (or the start), then every finished session. */
function WindingPanel({ designId, canWrite, initial, plan, defaults, current }: Props) {
  const { data: sessions = [] } = useWindingSessions(designId, initial);
  const active = sessions.find((s) => s.status !== 'finished');
  const finished = sessions.filter((s) => s.status === 'finished');
  return (
    <div className="space-y-10">
      <section aria-labelledby="winding-now">
        <h2 id="winding-now" className="text-2xl">
          {active ? 'Winding under way' : 'Start a session'}
        </h2>
        <div className="mt-3">
          {active && canWrite ? (
            <LiveSession key={active.id} designId={designId} session={active} />
          ) : !canWrite ? (
            <p className="text-ink-soft">Owners and editors run winding sessions; finished ones are listed below.</p>
          ) : plan ? (
            <StartForm designId={designId} plan={plan} defaults={defaults} />
          ) : (
            <p className="cw-alert">The design has invalid fields; fix it in the designer before winding.</p>
          )}
        </div>
      </section>
      <section aria-labelledby="winding-done">
        <h2 id="winding-done" className="text-2xl">
          Finished sessions
        </h2>
        <div className="mt-3 space-y-4">
          {finished.length === 0 ? (
            <p className="text-ink-soft">None yet.</p>
          ) : (
            finished.map((s) => <FinishedSession key={s.id} designId={designId} session={s} canWrite={canWrite} current={current} />)
          )}
        </div>
      </section>
    </div>
  );
}

export default withApi(WindingPanel);
