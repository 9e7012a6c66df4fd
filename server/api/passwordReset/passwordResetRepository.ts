/** Password resets: stored with the SHA-256 of their token, single use, with an expiry; one open link per user. */
import { Op, type Transaction } from 'sequelize';
import { PasswordResetModel, UserModel } from '../../db/models/accounts';

/** Create a reset for `userId`; the user's earlier unused links stop working. */
export async function createReset(data: { userId: number; tokenHash: string; expiresAt: Date }): Promise<void> {
  await PasswordResetModel.sequelize!.transaction(async (transaction) => {
    await PasswordResetModel.destroy({ where: { userId: data.userId, usedAt: null }, transaction });
    await PasswordResetModel.create({ ...data, usedAt: null }, { transaction });
  });
}

/** When the user's newest unused link was made, or null. */
export async function newestOpenAt(userId: number): Promise<Date | null> {
  const r = await PasswordResetModel.findOne({ where: { userId, usedAt: null }, order: [['createdAt', 'DESC']], attributes: ['createdAt'] });
  return r?.createdAt ?? null;
}

/** The open (unused, unexpired) reset with this token hash and its user's e-mail. */
export async function findOpen(tokenHash: string, now: Date, transaction?: Transaction): Promise<{ id: number; userId: number; email: string } | null> {
  const r = await PasswordResetModel.findOne({ where: { tokenHash, usedAt: null, expiresAt: { [Op.gt]: now } }, transaction });
  if (!r) return null;
  const user = await UserModel.findByPk(r.userId, { transaction });
  return user ? { id: r.id, userId: r.userId, email: user.email } : null;
}

/** Mark used, only if still unused (single use under concurrency); true when this call used it. */
export async function markUsed(id: number, now: Date, transaction: Transaction): Promise<boolean> {
  const [n] = await PasswordResetModel.update({ usedAt: now }, { where: { id, usedAt: null }, transaction });
  return n === 1;
}

/** Store a user's new password hash. */
export async function setPasswordHash(userId: number, passwordHash: string, transaction: Transaction): Promise<void> {
  await UserModel.update({ passwordHash }, { where: { id: userId }, transaction });
}
