-- The standard reason catalogue. Every verdict carries a reason code; ACCEPT has a default so
-- that accepting costs one key. Codes are never deleted or renamed, only retired.
insert into reason_code (catalogue, verdict, code, label, description, shortcut, is_default, retired, position) values
('standard', 'ACCEPT',   'as-drafted',            'Correct as drafted',            'The draft matches the imagery and is not yet on the map.', '1', true,  false, 1),
('standard', 'AMEND',    'geometry-adjusted',     'Geometry adjusted',             'The feature is real; its shape or position was corrected.', '1', false, false, 1),
('standard', 'AMEND',    'joined-to-network',     'Joined to the road network',    'An end was connected to a nearby road.', '2', false, false, 2),
('standard', 'AMEND',    'class-changed',         'Class changed',                 'The feature is real but of another class.', '3', false, false, 3),
('standard', 'REJECT',   'not-a-feature',         'Not a real feature',            'Nothing on the ground matches the draft (field edge, shadow, stream).', '1', false, false, 1),
('standard', 'REJECT',   'already-mapped',        'Already on the map',            'The reference layer already holds this feature.', '2', false, false, 2),
('standard', 'REJECT',   'shape-wrong',           'Shape too wrong to fix',        'The feature exists but the draft is too far off to amend.', '3', false, false, 3),
('standard', 'REJECT',   'detached-fragment',     'Detached fragment',             'A short piece that joins nothing and adds nothing useful.', '4', false, false, 4),
('standard', 'ESCALATE', 'imagery-obscured',      'Imagery obscured',              'Trees, cloud or shadow hide the ground; a lead should decide.', '1', false, false, 1),
('standard', 'ESCALATE', 'cannot-decide',         'Cannot decide from imagery',    'The imagery does not settle it either way.', '2', false, false, 2),
('standard', 'ESCALATE', 'needs-local-knowledge', 'Needs local knowledge',         'Only someone who knows the place can tell.', '3', false, false, 3);
