/**
 * Hostile corpus, the page's computation: a long run is abandoned when the
 * document changes (its worker is terminated and restarted), a budget over
 * the work limits is refused naming the field without running, and the page
 * recovers as soon as the input is fixed.
 */
import { expect, waitUntil } from '@open-wc/testing';
import { CANCEL_AFTER_MS } from '../../../web/compute/compute-controller';
import { freshApp, recomputed } from './helpers';

describe('the page computation under hostile edits', () => {
  it('abandons a long computation when the document changes and shows the newest document', async () => {
    const app = await freshApp();
    // The orchard rover at a 2 ms step: about 225 000 steps, seconds of work with contributions.
    app.store.edit('fine step', (d) => (d.settings.step = { value: 0.002, unit: 's' }));
    await new Promise((r) => setTimeout(r, CANCEL_AFTER_MS + 300));
    expect(app.compute.status).to.equal('pending');
    app.store.edit('coarse step', (d) => (d.settings.step = { value: 0.1, unit: 's' }));
    expect(app.compute.restarts).to.equal(1);
    await recomputed(app);
    expect(app.compute.view!.result!.mission.step_s).to.equal(0.1);
    app.remove();
  });

  it('refuses a GNSS rate over the work limit naming the field, and recovers when it is fixed', async () => {
    const app = await freshApp();
    const gnss = app.store.document.sensors.findIndex((s) => s.kind === 'gnss-position');
    app.store.edit('rate', (d) => (d.sensors[gnss].rate = { value: 20000, unit: 'Hz' }));
    await waitUntil(() => app.compute.status === 'complete' && app.compute.view?.blocked !== undefined, 'refusal', { timeout: 15000 });
    expect(app.compute.view!.blocked!.path).to.equal(`sensors[${gnss}].rate`);
    expect(app.compute.view!.blocked!.message).to.match(/20000 Hz gives .* scalar measurements over the mission; the limit is 5e6/);
    expect(app.store.document.sensors[gnss].rate.value).to.equal(20000);
    app.store.edit('rate fixed', (d) => (d.sensors[gnss].rate = { value: 5, unit: 'Hz' }));
    await recomputed(app);
    expect(app.compute.view!.blocked).to.equal(undefined);
    expect(app.compute.view!.result).to.not.equal(undefined);
    app.remove();
  });
});
