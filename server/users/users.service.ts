import { Op, type Sequelize } from 'sequelize';
import type { Role } from '../../shared/schemas/common';
import type { InviteBody } from '../../shared/schemas/auth';
import { hashSecret, newSecret } from '../auth/secretToken';
import { hashPassword } from '../auth/password';
import { ApiError, conflict, notFound } from '../http/errors';
import type { Mailer } from '../mail/mailer';
import { Nursery } from '../nurseries/nursery.model';
import { Invitation } from './invitation.model';
import { invitationMail } from './invitationMail';
import { User } from './user.model';

const INVITE_LIFETIME_MS = 72 * 3600 * 1000;

export async function listUsers(nurseryId: number) {
  const users = await User.findAll({ where: { nurseryId }, order: [['name', 'ASC']] });
  return users.map((u) => u.toPublic());
}

async function findUser(nurseryId: number, id: number) {
  const user = await User.findOne({ where: { id, nurseryId } });
  if (!user) throw notFound('That user');
  return user;
}

/** A nursery must keep at least one owner, or nobody could manage users again. */
async function assertAnotherOwner(nurseryId: number, leavingId: number) {
  const others = await User.count({ where: { nurseryId, role: 'owner', id: { [Op.ne]: leavingId } } });
  if (others === 0) throw conflict('last_owner', 'The nursery needs at least one owner; make someone else owner first.');
}

export async function changeRole(nurseryId: number, id: number, role: Role) {
  const user = await findUser(nurseryId, id);
  if (user.role === 'owner' && role !== 'owner') await assertAnotherOwner(nurseryId, id);
  await user.update({ role });
  return user.toPublic();
}

export async function removeUser(nurseryId: number, id: number) {
  const user = await findUser(nurseryId, id);
  if (user.role === 'owner') await assertAnotherOwner(nurseryId, id);
  await user.destroy();
}

export async function listInvitations(nurseryId: number) {
  const invitations = await Invitation.findAll({
    where: { nurseryId, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
    order: [['createdAt', 'DESC']],
  });
  return invitations.map((i) => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt }));
}

export async function invite(deps: { mailer: Mailer; appOrigin: string }, nurseryId: number, inviterId: number, body: InviteBody) {
  if (await User.findOne({ where: { email: body.email } })) {
    throw conflict('email_taken', 'Someone already signs in with that e-mail.');
  }
  const [nursery, inviter] = await Promise.all([Nursery.findByPk(nurseryId), User.findByPk(inviterId)]);
  const { secret, hash } = newSecret();
  const expiresAt = new Date(Date.now() + INVITE_LIFETIME_MS);
  const invitation = await Invitation.create({ nurseryId, email: body.email, role: body.role, tokenHash: hash, invitedBy: inviterId, expiresAt });
  await deps.mailer.send(
    invitationMail({
      to: body.email,
      nurseryName: nursery!.name,
      timeZone: nursery!.timeZone,
      inviterName: inviter!.name,
      role: body.role,
      link: `${deps.appOrigin}/invite/${secret}`,
      expiresAt,
    }),
  );
  return { id: invitation.id, email: invitation.email, role: invitation.role, expiresAt };
}

export async function cancelInvitation(nurseryId: number, id: number) {
  const deleted = await Invitation.destroy({ where: { id, nurseryId, acceptedAt: null } });
  if (!deleted) throw notFound('That invitation');
}

async function openInvitation(token: string) {
  const invitation = await Invitation.findOne({ where: { tokenHash: hashSecret(token) } });
  if (!invitation || invitation.acceptedAt || invitation.expiresAt.getTime() < Date.now()) {
    throw new ApiError(410, 'invitation_invalid', 'This invitation link has been used or has expired; ask the owner for a new one.');
  }
  return invitation;
}

export async function describeInvitation(token: string) {
  const invitation = await openInvitation(token);
  const nursery = await Nursery.findByPk(invitation.nurseryId);
  return { email: invitation.email, role: invitation.role, nurseryName: nursery!.name };
}

/** Single use even under a double click: the acceptance is claimed with a conditional update inside the transaction. */
export async function acceptInvitation(sequelize: Sequelize, token: string, name: string, password: string) {
  const invitation = await openInvitation(token);
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const [claimed] = await Invitation.update(
      { acceptedAt: new Date() },
      { where: { id: invitation.id, acceptedAt: null }, transaction },
    );
    if (claimed !== 1) throw new ApiError(410, 'invitation_invalid', 'This invitation link has already been used.');
    if (await User.findOne({ where: { email: invitation.email }, transaction })) {
      throw conflict('email_taken', 'Someone already signs in with that e-mail.');
    }
    return User.create(
      { nurseryId: invitation.nurseryId, email: invitation.email, name, passwordHash, role: invitation.role },
      { transaction },
    );
  });
}
