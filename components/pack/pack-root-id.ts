// The pack's root element id (nativeID, an id attribute on the web): the print stylesheet scopes its rules to it.
export const PACK_ROOT_ID = 'change-pack';
