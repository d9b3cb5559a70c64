import { beforeAll, describe, expect, it } from 'vitest';
import { createPlant, createUser } from '../support/factories';
import { SCREENSHOTS, signInAs } from '../support/browser';
import { servedBrowser } from '../support/servedBrowser';
import { Plant, type User } from '../../server/models';
import { saveDesignRules } from '../../server/commands/designRules';

const web = servedBrowser();
let admin: User;
let otherAdmin: User;
let plant: Plant;

beforeAll(async () => {
  plant = await createPlant({ name: 'Design Rules Plant' });
  admin = await createUser({ role: 'admin', plant });
  otherAdmin = await createUser({ role: 'admin', plant });
});

const storedRules = async () => (await Plant.findByPk(plant.id))!.settings?.designRules;

describe('design rules in a browser', () => {
  it('the plant manager turns on the stricter §3.9.2 check from the Plant menu, and a stale save says so', async () => {
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1280, height: 800 });
    await signInAs(web.browser, page, web.base, admin.email);
    await page.getByRole('button', { name: 'Plant' }).click();
    await page.getByRole('link', { name: 'Design rules' }).click();
    await page.waitForURL(`${web.base}/design-rules`);
    await page.getByRole('heading', { name: 'Design rules', level: 1 }).waitFor();

    const common = page.getByRole('radio', { name: /Common practice/ });
    const strict = page.getByRole('radio', { name: /Stricter: amplify the panel-point moment/ });
    expect(await common.isChecked()).toBe(true);
    expect(await page.getByText('Version 0', { exact: true }).count()).toBe(1);
    await strict.check();
    await page.screenshot({ path: `${SCREENSHOTS}/design-rules-desktop.png`, fullPage: true });
    await page.getByRole('button', { name: 'Save design rules' }).click();
    await page.getByText('Saved. New designs use this rule.').waitFor();
    await page.getByText('Version 1', { exact: true }).waitFor();
    expect(await storedRules()).toEqual({ amplifyPanelPointMoment: true, version: 1 });

    // Someone else saves meanwhile: this page still holds version 1.
    await saveDesignRules(otherAdmin, { amplifyPanelPointMoment: false, version: 1 });
    await page.getByRole('radio', { name: /Common practice/ }).check();
    await page.getByRole('button', { name: 'Save design rules' }).click();
    await page.getByText('Someone else changed the rules').waitFor();
    // The page reloads the current rules (version 2, common practice) and the next save works.
    await page.getByText('Version 2', { exact: true }).waitFor();
    expect(await page.getByRole('radio', { name: /Common practice/ }).isChecked()).toBe(true);
    await page.getByRole('radio', { name: /Stricter/ }).check();
    await page.getByRole('button', { name: 'Save design rules' }).click();
    await page.getByText('Version 3', { exact: true }).waitFor();
    expect(await storedRules()).toEqual({ amplifyPanelPointMoment: true, version: 3 });
    await page.close();
  });
});
