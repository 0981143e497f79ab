/** Types of pack-packages.mjs (see there). */
export declare const ROOT: string;
export interface WorkspacePackage {
  readonly dir: string;
  readonly name: string;
  readonly version: string;
  readonly private: boolean;
}
export interface PackedPackage {
  readonly name: string;
  readonly version: string;
  /** Absolute path of the .tgz. */
  readonly tarball: string;
  /** Paths inside the package, e.g. `dist/index.d.ts`. */
  readonly files: readonly string[];
}
export declare function workspacePackages(): WorkspacePackage[];
export declare function packWorkspace(destDir: string): Promise<PackedPackage[]>;
