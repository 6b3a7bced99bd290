import { compose, type Message } from "./layout";

/** An invitation to work on someone's plan. */
export function invitationMessage(p: { inviterName: string; planName: string; role: "editor" | "viewer"; url: string; expiresDays: number }): Message {
  const can = p.role === "editor" ? "look at it and change it" : "look at it (without changing it)";
  return compose({
    subject: `${p.inviterName} asked you to join the plan "${p.planName}"`,
    greeting: "Hello,",
    paragraphs: [
      `${p.inviterName} is laying out a shop with Benchwright and would like you to ${can}: "${p.planName}".`,
      `Open the link below, sign in or make an account with this e-mail address, and the plan will appear in your list. The link works for ${p.expiresDays} days.`,
    ],
    action: { label: "Open the invitation", url: p.url },
    footnote: "Not expecting this? Ignore the message; nothing happens unless the link is opened.",
  });
}

/** A link to choose a new password. */
export function resetMessage(p: { name: string; url: string; expiresMinutes: number }): Message {
  return compose({
    subject: "Choose a new Benchwright password",
    greeting: `Hello ${p.name},`,
    paragraphs: [
      "Someone (hopefully you) asked to set a new password for this Benchwright account.",
      `The link below lets you choose one. It works once, for ${p.expiresMinutes} minutes.`,
    ],
    action: { label: "Choose a new password", url: p.url },
    footnote: "If you did not ask for this, ignore the message: your password stays as it is.",
  });
}

/** A link that confirms the account's e-mail address. */
export function verifyMessage(p: { name: string; url: string; expiresHours: number }): Message {
  return compose({
    subject: "Confirm your e-mail address for Benchwright",
    greeting: `Hello ${p.name},`,
    paragraphs: [
      "Please confirm that this address belongs to your Benchwright account, so invitations and password links reach you.",
      `The link works for ${p.expiresHours} hours.`,
    ],
    action: { label: "Confirm my address", url: p.url },
    footnote: "If you did not make an account, ignore the message.",
  });
}
