// Adding a member is inviting them: the person joins only by accepting the e-mailed link, and
// the answer is the same whether or not the address has an account (no account discovery).
export { default } from '../invitations/index.post'
