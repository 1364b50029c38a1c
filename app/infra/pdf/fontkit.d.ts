declare module "fontkit";
