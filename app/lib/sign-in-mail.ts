export function signInCodeMail(input: { to: string; displayName: string; code: string; magicLink: string; minutes: number }) {
  const minutes = input.minutes >= 1 ? `${Math.round(input.minutes)} minutes` : `${Math.round(input.minutes * 60)} seconds`;
  const text = [
    `Hello ${input.displayName},`,
    "",
    `Your Betasift sign-in code is: ${input.code}`,
    "",
    `Or open this link in the same browser: ${input.magicLink}`,
    "",
    `The code works for ${minutes}. If you did not ask for it, ignore this e-mail.`,
  ].join("\n");
  return { to: input.to, subject: `Betasift sign-in code ${input.code}`, text };
}
