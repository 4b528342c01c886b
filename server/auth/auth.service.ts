import type { Sequelize } from 'sequelize';
import { Nursery } from '../nurseries/nursery.model';
import { User } from '../users/user.model';
import type { SignupBody } from '../../shared/schemas/auth';
import { ApiError, conflict, unauthorized } from '../http/errors';
import { hashPassword, verifyPassword } from './password';

export async function currentUser(userId: number) {
  const user = await User.findByPk(userId);
  if (!user) throw unauthorized();
  const nursery = await Nursery.findByPk(user.nurseryId);
  return { user: user.toPublic(), nursery: nursery && { id: nursery.id, name: nursery.name, timeZone: nursery.timeZone } };
}

// A fixed hash to compare against when the e-mail is unknown, so a wrong address costs as long as a wrong password.
const DUMMY_HASH = '$2b$12$k06SSL8/xxbrLk6NlpWjTOHa0/Zaeei5r3NAUkj1jLLa3oAZOntf2';

export async function login(email: string, password: string) {
  const user = await User.findOne({ where: { email } });
  const ok = await verifyPassword(password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok) throw new ApiError(401, 'bad_credentials', 'That e-mail and password do not match.');
  return user;
}

export async function signup(sequelize: Sequelize, body: SignupBody) {
  if (await User.findOne({ where: { email: body.email } })) {
    throw conflict('email_taken', 'An account with that e-mail already exists; sign in instead.');
  }
  const passwordHash = await hashPassword(body.password);
  return sequelize.transaction(async (transaction) => {
    const nursery = await Nursery.create({ name: body.nurseryName, timeZone: body.timeZone }, { transaction });
    return User.create({ nurseryId: nursery.id, email: body.email, name: body.name, passwordHash, role: 'owner' }, { transaction });
  });
}

export async function changePassword(userId: number, currentPassword: string, newPassword: string) {
  const user = await User.findByPk(userId);
  if (!user) throw unauthorized();
  if (!(await verifyPassword(currentPassword, user.passwordHash))) {
    throw new ApiError(400, 'bad_credentials', 'The current password is not right.');
  }
  await user.update({ passwordHash: await hashPassword(newPassword), sessionVersion: user.sessionVersion + 1 });
  return user;
}
