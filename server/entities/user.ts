import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A person who signs in. The e-mail is stored lower-cased and is unique. */
@Entity({ name: 'app_user' })
export class User {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'varchar', length: 254, unique: true })
  email!: string;

  @Column({ type: 'varchar', length: 120 })
  name!: string;

  /** bcrypt hash (bcryptjs). */
  @Column({ type: 'varchar', length: 100 })
  passwordHash!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
