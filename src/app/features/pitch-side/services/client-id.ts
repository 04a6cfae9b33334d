/** A unique id for one pitch-side action, so the server stores a replayed action once. */
export { randomId as newClientId } from '../../../core/ids/random-id';
