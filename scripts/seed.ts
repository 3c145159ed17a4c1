/**
 * Demo data, all invented: an owner and a viewer account, and a project of a fictitious research group with
 * five scenarios (flat space, a lab hovering outside a stellar-mass black hole, an accelerated lab, and two with the
 * lab's environment: a charged silica sphere above a gold-coated chip in a cryostat, a neutral diamond held long in
 * a room-temperature vacuum; the documents are in scripts/demo-documents.ts), and, when the
 * object store is up (scripts/services.sh starts the fake one), a sequencer run kept with the flat-space scenario.
 * Idempotent: a second run finds the demo account and changes nothing. Run with the react-server condition
 * (npm run db:seed) so that the data access layer's server-only marker resolves.
 */
import { uploadAttachment } from "../db/attachments";
import { createDb } from "../db/connect";
import { createInvitation } from "../db/invitations";
import { addMemberByEmail } from "../db/members";
import { createProject } from "../db/projects";
import { createScenario } from "../db/scenarios";
import { createShareLink } from "../db/share-links";
import { createUser, findUserByEmail } from "../db/users";
import { sendInvitationMail } from "../lib/invitation-mail";
import { shareUrl } from "../lib/links";
import { createObjectStore } from "../lib/storage";
import { acceleratedLab, flatSpaceStudy, hoveringLab, neutralDiamondLongHold, silicaAboveGoldChip } from "./demo-documents";

export const DEMO_OWNER = { email: "owner@lindenbrook.example", password: "lindenbrook-demo-owner", name: "Demo Owner (group lead)" };
export const DEMO_VIEWER = { email: "referee@lindenbrook.example", password: "lindenbrook-demo-viewer", name: "Demo Viewer (referee)" };

/** An invented sequencer run: separate over 40 ms with a cubic ramp (3u² − 2u³), hold 2.5 µm for 120 ms, recombine over 40 ms. */
function sequencerRunCsv(): string {
  const rows = ["t [ms],separation [um]"];
  const ramp = (u: number) => u * u * (3 - 2 * u);
  for (let t = 0; t <= 200; t += 5) {
    const d = t < 40 ? ramp(t / 40) : t <= 160 ? 1 : ramp((200 - t) / 40);
    rows.push(`${t},${(2.5 * d).toFixed(4)}`);
  }
  return `${rows.join("\n")}\n`;
}

async function seed(): Promise<void> {
  const db = createDb(undefined, 2);
  try {
    if (await findUserByEmail(db, DEMO_OWNER.email)) {
      console.log("[seed] demo data already present");
      return;
    }
    const owner = await createUser(db, { ...DEMO_OWNER, emailVerified: true, siteRole: "admin" });
    await createUser(db, { ...DEMO_VIEWER, emailVerified: true });
    const actor = { userId: owner.id, siteRole: owner.siteRole };
    const project = await createProject(db, actor, {
      name: "Lindenbrook matter-wave group: horizon budget",
      description: "Which-path budgets for a charged microsphere interferometer, from the bench to a lab near a horizon (invented demo data).",
    });
    await addMemberByEmail(db, actor, project.id, DEMO_VIEWER.email, "viewer");
    const flat = await createScenario(db, actor, project.id, { title: "Charged microsphere: flat-space recombination study", document: flatSpaceStudy() });
    const hovering = await createScenario(db, actor, project.id, { title: "Lab hovering outside a 10 M☉ black hole", document: hoveringLab() });
    await createScenario(db, actor, project.id, { title: "Uniformly accelerated lab at 10¹⁸ m/s²", document: acceleratedLab() });
    await createScenario(db, actor, project.id, { title: "Charged silica sphere 40 µm above a gold-coated chip, 4 K", document: silicaAboveGoldChip() });
    await createScenario(db, actor, project.id, { title: "Neutral diamond, 10 s hold in a room-temperature vacuum", document: neutralDiamondLongHold() });
    console.log("[seed] created the demo project with five scenarios");
    const link = await createShareLink(db, actor, project.id, hovering.id, { label: "for the seminar slides", expiresInDays: 30 });
    console.log(`[seed] a read-only share link of the black-hole scenario: ${shareUrl(link.token)}`);
    try {
      await createInvitation(db, actor, project.id, { email: "new-postdoc@lindenbrook.example", role: "editor" }, sendInvitationMail);
      console.log("[seed] invited new-postdoc@lindenbrook.example as editor (the letter is in the demo mailbox)");
    } catch (error) {
      console.log(`[seed] no demo invitation: the mail server is not reachable (${error instanceof Error ? error.message : error})`);
    }
    try {
      const bytes = new TextEncoder().encode(sequencerRunCsv());
      await uploadAttachment(db, createObjectStore(), actor, project.id, flat.id, { fileName: "sequencer-run-0412.csv", mediaType: "text/csv", bytes });
      console.log("[seed] kept an invented sequencer run with the flat-space scenario");
    } catch (error) {
      console.log(`[seed] no demo attachment: the object store is not reachable (${error instanceof Error ? error.message : error})`);
    }
  } finally {
    await db.destroy();
  }
}

if (require.main === module) {
  seed().catch((err) => {
    console.error("[seed] failed:", err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
