// @ts-check
// The production build's browser files. The folder never changes while the server runs, so its
// file list is read once and only those paths reach serve-static: app routes cost no disk lookup.
import { readdirSync } from "node:fs";
import { join, relative, sep } from "node:path";
import express from "express";

/** Every file under `dir`, as URL paths ("/assets/app-1234.js"). @param {string} dir */
export function listFiles(dir) {
  return new Set(
    readdirSync(dir, { recursive: true, withFileTypes: true })
      .filter((entry) => entry.isFile())
      .map((entry) => "/" + relative(dir, join(entry.parentPath, entry.name)).split(sep).join("/")),
  );
}

/** @param {string} client the build's client folder @returns {import("express").RequestHandler} */
export function staticFiles(client) {
  const files = listFiles(client);
  const assets = express.static(client, { immutable: true, maxAge: "1y", index: false, redirect: false });
  const others = express.static(client, { maxAge: "1h", index: false, redirect: false });
  return (req, res, next) => {
    if (req.method !== "GET" && req.method !== "HEAD") return next();
    let path;
    try {
      path = decodeURIComponent(req.path);
    } catch {
      return next();
    }
    if (!files.has(path)) return next();
    (path.startsWith("/assets/") ? assets : others)(req, res, next);
  };
}
