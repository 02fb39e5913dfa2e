/** The complex number record shared by the physics modules (plain data, easy to serialise). */
export interface Complex {
  re: number;
  im: number;
}
