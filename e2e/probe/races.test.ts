import { beforeAll, describe, expect, it } from "vitest";
import { browserAvailable } from "../support/session";
import { discoverServerActions, type ServerAction } from "./support/app-map";
import { recordFigure } from "./support/figures";
import { callAction, signIn, type ActionAnswer, type Session } from "./support/probe-client";
import { makeProbeUser } from "./support/probe-database";
import { countHolders, makeApprovedResult, makeDraftCertificate, makeInstrument, makeIssuedCertificate, makeSpecimen } from "./support/probe-fixtures";
import { samplePath } from "./support/sample-paths";

/*
 * Two people doing the same thing at the same moment, through the app's own server actions, over HTTP:
 * the database must let exactly one through, and the other must hear what they collided with (409-style:
 * CONFLICT, or ILLEGAL_TRANSITION when they arrived just after). "Won twice" counts trials in which both
 * went through: it must stay 0.
 */
const LOSER_CODES = ["CONFLICT", "ILLEGAL_TRANSITION"];

describe.skipIf(!browserAvailable())("probe: races between two people, decided by the database", () => {
  const people: Record<"tech1" | "tech2" | "qa1" | "qa2", { id: string; session: Session; password: string }> = {} as never;
  let actions: Map<string, ServerAction>;
  const races: Record<string, { tried: number; wonTwice: number }> = {};

  beforeAll(async () => {
    for (const [key, role] of [["tech1", "TECHNICIAN"], ["tech2", "TECHNICIAN"], ["qa1", "QA_MANAGER"], ["qa2", "QA_MANAGER"]] as const) {
      const person = await makeProbeUser(role, `race-${key}`);
      people[key] = { id: person.id, password: person.password, session: await signIn(person.email, person.password) };
    }
    actions = new Map(discoverServerActions().map((a) => [a.name, a]));
  });

  /** Both calls at once; returns the two answers, and counts the trial. */
  async function race(name: string, actionName: string, first: [Session, unknown], second: [Session, unknown]): Promise<ActionAnswer[]> {
    const action = actions.get(actionName);
    if (!action) throw new Error(`no server action ${actionName} in the build`);
    const page = await samplePath(action.pages[0]!);
    const answers = await Promise.all([first, second].map(([session, input]) => callAction(action.id, page, [input], session)));
    const wins = answers.filter((a) => a.result?.ok).length;
    races[name] ??= { tried: 0, wonTwice: 0 };
    races[name].tried += 1;
    if (wins > 1) races[name].wonTwice += 1;
    expect(answers.map((a) => a.status)).toEqual([200, 200]);
    expect(wins, `${name}: ${answers.map((a) => a.result?.message).join(" | ")}`).toBe(1);
    const loser = answers.find((a) => !a.result?.ok)!;
    expect(LOSER_CODES).toContain(loser.result?.code);
    return answers;
  }

  const assignInput = (specimenId: string, cellId: string, kit: { panel: string; transducer: string }) => ({
    specimenId, cellId, burettePanelId: kit.panel, transducerId: kit.transducer, methodCode: "D5887", pressureUnit: "KPA", effectiveStress: "34.5", mountedAt: new Date().toISOString(),
  });

  it("one free cell, two technicians mounting different specimens: one run, the other told which run has the cell", async () => {
    for (let trial = 0; trial < 5; trial++) {
      const [cell, panel, transducer] = await Promise.all([makeInstrument("PERMEAMETER_CELL", people.qa1.id), makeInstrument("BURETTE_PANEL", people.qa1.id), makeInstrument("PRESSURE_TRANSDUCER", people.qa1.id)]);
      const kit = { panel: panel.id, transducer: transducer.id };
      const [a, b] = await Promise.all([makeSpecimen(people.tech1.id), makeSpecimen(people.tech2.id)]);
      const answers = await race("cell", "assignSpecimenAction", [people.tech1.session, assignInput(a.specimen.id, cell.id, kit)], [people.tech2.session, assignInput(b.specimen.id, cell.id, kit)]);
      const winner = (answers.find((x) => x.result?.ok)!.result!.data as { labNumber: string }).labNumber;
      expect(answers.find((x) => !x.result?.ok)!.result!.message).toContain(winner);
      expect(await countHolders({ cellId: cell.id })).toBe(1);
    }
  });

  it("one specimen, two technicians mounting it in different cells: one run", async () => {
    for (let trial = 0; trial < 5; trial++) {
      const [cell1, cell2, panel, transducer] = await Promise.all([makeInstrument("PERMEAMETER_CELL", people.qa1.id), makeInstrument("PERMEAMETER_CELL", people.qa1.id), makeInstrument("BURETTE_PANEL", people.qa1.id), makeInstrument("PRESSURE_TRANSDUCER", people.qa1.id)]);
      const kit = { panel: panel.id, transducer: transducer.id };
      const { specimen } = await makeSpecimen(people.tech1.id);
      const answers = await race("specimen", "assignSpecimenAction", [people.tech1.session, assignInput(specimen.id, cell1.id, kit)], [people.tech2.session, assignInput(specimen.id, cell2.id, kit)]);
      expect(answers.find((x) => !x.result?.ok)!.result!.message).toContain(specimen.labNumber);
      expect(await countHolders({ specimenId: specimen.id })).toBe(1);
    }
  });

  it("one approved result, two QA managers drafting certificates with it: one live certificate, the other told which", async () => {
    for (let trial = 0; trial < 5; trial++) {
      const { projectId, resultId } = await makeApprovedResult(people.tech1.id, people.qa1.id);
      const input = { projectId, resultIds: [resultId] };
      const answers = await race("result", "createCertificateDraftAction", [people.qa1.session, input], [people.qa2.session, input]);
      const winner = (answers.find((x) => x.result?.ok)!.result!.data as { number: string }).number;
      expect(answers.find((x) => !x.result?.ok)!.result!.message).toContain(winner);
      expect(await countHolders({ resultId })).toBe(1);
    }
  });

  it("one draft, two QA managers signing it: issued once, with one signature", async () => {
    for (let trial = 0; trial < 3; trial++) {
      const { projectId, resultId } = await makeApprovedResult(people.tech1.id, people.qa1.id);
      const draft = await makeDraftCertificate(projectId, [resultId]);
      const answers = await race("issue", "issueCertificateAction", [people.qa1.session, { revisionId: draft.revisionId, password: people.qa1.password }], [people.qa2.session, { revisionId: draft.revisionId, password: people.qa2.password }]);
      expect(answers.find((x) => !x.result?.ok)!.result!.message).toContain(draft.number);
      expect(await countHolders({ certificateId: draft.certificateId })).toBe(1);
    }
  }, 120_000);

  it("one issued certificate, two QA managers correcting it: one new revision", async () => {
    for (let trial = 0; trial < 5; trial++) {
      const { projectId, resultId } = await makeApprovedResult(people.tech1.id, people.qa1.id);
      const issued = await makeIssuedCertificate(projectId, [resultId], people.qa1.id);
      const input = { certificateId: issued.certificateId, reason: "Probe correction of the client address" };
      const answers = await race("revise", "reviseCertificateAction", [people.qa1.session, input], [people.qa2.session, input]);
      expect(answers.find((x) => !x.result?.ok)!.result!.message).toContain(issued.number);
      expect(await countHolders({ certificateId: issued.certificateId })).toBe(2);
    }
  });

  it("adds up to no race won twice", () => {
    const tried = Object.values(races).reduce((n, r) => n + r.tried, 0);
    const wonTwice = Object.values(races).reduce((n, r) => n + r.wonTwice, 0);
    recordFigure("09-races", { label: "races (cell, specimen, result, issue, revise)", values: { "races tried": tried, "won twice": wonTwice, each: Object.entries(races).map(([k, r]) => `${k} ${r.tried}/${r.wonTwice}`).join(" ") } });
    expect(wonTwice).toBe(0);
  });
});
