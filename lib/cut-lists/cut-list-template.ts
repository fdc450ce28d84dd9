// A downloadable starting point. The rows are an invented example (a small garden shed wall),
// showing each length notation the import reads, and a nominal line (it may be cut a few mm short).
export const CUT_LIST_TEMPLATE_CSV = [
  'section,length,quantity,label,note,tolerance',
  '47x100 C24,2400,9,stud,back wall at 600 centres,nominal',
  '47x100 C24,3.6 m,2,plate,head and sole plate,exact',
  '47x100 C24,565,8,noggin,,',
  '38x89 CLS,"7\'-8 5/8""",4,door stud,"either side of the door, cut square",',
  '',
].join('\n');

export const OFFCUT_RACK_TEMPLATE_CSV = [
  'section,length,location,tag',
  '47x100 C24,1250,Bay 2 top,',
  '38x89 CLS,"4\'-0""",Bay 3,K-0007',
  '',
].join('\n');
